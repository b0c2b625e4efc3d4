import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SecretsCard } from '@/components/report/SecretsCard';
import { api } from '@/lib/api/client';
import type { SecretsStatus } from '@/shared/api/secrets';
import { people } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const get = api.get as jest.Mock;
const post = api.post as jest.Mock;

const STATUS: SecretsStatus = {
  mode: 'mutual',
  generatedAt: '2026-11-30T09:00:00.000Z',
  generatedBy: { id: 2, name: 'Ravi Menon' },
  length: 16,
  hosts: [
    { host: 'wms-db-1', name: 'wms-db-1', directions: ['initiator', 'target'] },
    { host: 'cam-rec-1', name: 'cam-rec-1', directions: ['initiator', 'target'] },
  ],
  reveals: [],
};
// Made up for the test, in the product's alphabet; not from any device.
const SHOWN = [
  { host: 'wms-db-1', name: 'wms-db-1', direction: 'initiator', secret: 'Qm3v-Tz8_kLp0aWx' },
  { host: 'wms-db-1', name: 'wms-db-1', direction: 'target', secret: 'n7Rb2Yc-Je5_Ff9H' },
];

beforeEach(() => {
  get.mockReset();
  post.mockReset();
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1/secrets/status') return { status: STATUS };
    if (path === '/api/designs/1/secrets?host=wms-db-1') return { secrets: SHOWN, generatedAt: STATUS.generatedAt, notice: 'Keep these secrets out of e-mail.' };
    throw new Error(`unexpected request ${path}`);
  });
});

describe('CHAP secrets on the report', () => {
  it('shows an installer one host’s secrets only after a warning that the showing is recorded', async () => {
    renderWithClient(<SecretsCard id={1} />, { user: people.installer });
    fireEvent.press(await screen.findByTestId('secrets-host-wms-db-1-show'));
    expect(screen.getByTestId('secrets-host-wms-db-1-warning')).toHaveTextContent(/recorded/);
    expect(get).not.toHaveBeenCalledWith('/api/designs/1/secrets?host=wms-db-1');
    fireEvent.press(screen.getByTestId('secrets-host-wms-db-1-confirm'));
    expect(await screen.findByTestId('secrets-host-wms-db-1-initiator')).toHaveTextContent(/^Initiator \(host → target\): Qm3v-Tz8_kLp0aWx$/);
    expect(screen.getByTestId('secrets-host-wms-db-1-target')).toHaveTextContent(/: n7Rb2Yc-Je5_Ff9H$/);
    expect(get).toHaveBeenCalledTimes(3); // status, the one showing, and the status again after it
    expect(screen.queryByTestId('secrets-host-cam-rec-1-initiator')).toBeNull();
    // Installers do not make secrets.
    expect(screen.queryByTestId('report-secrets-generate')).toBeNull();
    await waitFor(() => expect(get).toHaveBeenCalledTimes(3));
  });

  it('offers a reviewer no showing at all, and a designer only making new ones with the warning about the old', async () => {
    const { unmount } = renderWithClient(<SecretsCard id={1} />, { user: people.reviewer });
    expect(await screen.findByTestId('report-secrets-state')).toHaveTextContent(/Made .* by Ravi Menon: 16 characters, for 2 hosts/);
    expect(screen.queryByTestId('secrets-host-wms-db-1-show')).toBeNull();
    expect(screen.queryByTestId('report-secrets-generate')).toBeNull();
    unmount();

    post.mockResolvedValue({ generated: { hosts: 2, secrets: 4, length: 16, mode: 'mutual', at: STATUS.generatedAt, version: 2 }, notice: 'The old secrets keep working on the hosts and the array until they are changed there.' });
    renderWithClient(<SecretsCard id={1} />, { user: people.designer });
    fireEvent.press(await screen.findByTestId('report-secrets-generate'));
    expect(await screen.findByTestId('report-secrets-notice')).toHaveTextContent(/keep working .* until they are changed there/);
    expect(post).toHaveBeenCalledWith('/api/designs/1/secrets', {});
    expect(screen.queryByTestId('secrets-host-wms-db-1-show')).toBeNull();
  });
});
