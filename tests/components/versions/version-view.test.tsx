import { fireEvent, screen, within } from '@testing-library/react-native';
import { VersionScreen } from '@/components/versions/VersionScreen';
import { api } from '@/lib/api/client';
import { designResponse, docs, people, versionDetail, versionSummary } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({ __esModule: true, default: jest.fn() }));
const dimensions: jest.Mock = jest.requireMock('react-native/Libraries/Utilities/useWindowDimensions').default;
const get = api.get as jest.Mock;

beforeEach(() => {
  get.mockReset();
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1/versions/2') return { version: versionDetail({ number: 2, doc: docs.v2, state: 'approved' }) };
    if (path === '/api/designs/1') return designResponse([versionSummary({ number: 2, doc: docs.v2 })]);
    throw new Error(`unexpected request ${path}`);
  });
});

describe('read-only version view', () => {
  it('shows every device with its cards and ports, then cables and networks on their tabs', async () => {
    dimensions.mockReturnValue({ width: 390, height: 844, scale: 1, fontScale: 1 });
    renderWithClient(<VersionScreen id={1} n={2} />, { user: people.installer });
    const devices = await screen.findByTestId('version-devices');
    for (const device of docs.v2.devices) expect(within(devices).getByTestId(`device-${device.id}`)).toBeOnTheScreen();
    expect(within(devices).getByTestId('port-cam-rec-2.card-2.p1')).toHaveTextContent(/fabric B/);
    // docs/demo.md: version 2 cables cam-rec-2's card-2 to fab-b.
    expect(within(devices).getByTestId('port-cam-rec-2.card-2.p1')).toHaveTextContent(/→ fab-b p\d+/);
    expect(screen.getByTestId('version-tabs-cables')).toHaveTextContent(`Cables (${docs.v2.cables.length})`);

    fireEvent.press(screen.getByTestId('version-tabs-cables'));
    const cables = screen.getByTestId('version-cables');
    for (const cable of docs.v2.cables) expect(within(cables).getByTestId(`version-cables-${cable.id}`)).toHaveTextContent(new RegExp(cable.label!));

    fireEvent.press(screen.getByTestId('version-tabs-networks'));
    // docs/demo.md: fabric B is 203.0.113.0/24 on VLAN 120 (RFC 5737 range).
    expect(screen.getByTestId('version-networks-net-fabric-b')).toHaveTextContent(/203\.0\.113\.0\/24.*120/);
  });
});
