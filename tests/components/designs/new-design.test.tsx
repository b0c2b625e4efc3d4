import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { NewDesignScreen } from '@/components/designs/NewDesignScreen';
import { api, ApiRequestError } from '@/lib/api/client';
import { buildCreateBody, DEFAULT_PATTERN_VALUES, PATTERN_HINTS } from '@/lib/designs/new-design';
import { readTopologyText, type ImportResult } from '@/lib/import';
import { dualFabric, dualFabricWithManagement, PATTERNS } from '@/shared/patterns';
import { validateTopology } from '@/shared/topology/validate';
import { docs, harborDesign, people } from './helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const mockReplace = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: React.ReactNode }) => children,
  useRouter: () => ({ replace: mockReplace, back: jest.fn() }),
}));
const post = api.post as jest.Mock;

function renderForm(pickFile?: () => Promise<ImportResult | null>) {
  return renderWithClient(<NewDesignScreen pickFile={pickFile} />, { user: people.designer });
}

/** A file with three mistakes: a host without an id, an unknown cable media, a prefix longer than 32 bits. */
const BROKEN = JSON.stringify({
  format: 'cablewright.topology/1',
  name: 'Pier 4',
  devices: [{ id: '', kind: 'host', name: 'pier-4-db', adapters: [] }],
  cables: [{ id: 'c1', a: 'pier-4-db.p1', b: 'fab-a.p1', media: 'cat9' }],
  networks: [{ id: 'net-a', name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/33' }],
});

beforeEach(() => {
  post.mockReset();
  mockReplace.mockReset();
});

describe('new design form', () => {
  it('asks for a name and sends nothing without one', () => {
    renderForm();
    fireEvent.press(screen.getByTestId('new-design-submit'));
    expect(screen.getByTestId('new-design-name-error')).toHaveTextContent('Give the design a name');
    expect(post).not.toHaveBeenCalled();
  });

  it('refuses a host count that is not a whole number or is zero', () => {
    renderForm();
    fireEvent.changeText(screen.getByTestId('new-design-name'), 'Pier 4 cold rooms');
    fireEvent.changeText(screen.getByTestId('new-design-hosts'), 'six');
    fireEvent.press(screen.getByTestId('new-design-submit'));
    expect(screen.getByTestId('new-design-hosts-error')).toHaveTextContent('Enter the number of hosts as a whole number');
    fireEvent.changeText(screen.getByTestId('new-design-hosts'), '0');
    fireEvent.press(screen.getByTestId('new-design-submit'));
    expect(screen.getByTestId('new-design-hosts-error')).toHaveTextContent('At least 1 host');
    expect(post).not.toHaveBeenCalled();
  });

  it('builds the dual-fabric pattern in the browser and sends it as version 1', async () => {
    post.mockResolvedValueOnce({ design: { ...harborDesign, id: 7 }, version: null });
    renderForm();
    fireEvent.changeText(screen.getByTestId('new-design-name'), 'Pier 4 cold rooms');
    fireEvent.changeText(screen.getByTestId('new-design-site'), 'Pier 4');
    fireEvent.press(screen.getByTestId('new-design-pattern-kind-dual-fabric'));
    fireEvent.changeText(screen.getByTestId('new-design-hosts'), '3');
    fireEvent.press(screen.getByTestId('new-design-submit'));
    const expected = dualFabric({ name: 'Pier 4 cold rooms', hosts: 3, cardsPerHost: 2, portsPerCard: 2 });
    await waitFor(() => expect(post).toHaveBeenCalledWith('/api/designs', { name: 'Pier 4 cold rooms', site: 'Pier 4', document: expected }));
    expect(validateTopology(post.mock.calls[0][1].document).ok).toBe(true);
    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith({ pathname: '/designs/[id]', params: { id: 7 } }));
  });

  it('previews the chosen pattern with the analysis of the document it will send', () => {
    renderForm();
    fireEvent.press(screen.getByTestId('new-design-pattern-kind-dual-fabric-management'));
    fireEvent.changeText(screen.getByTestId('new-design-hosts'), '2');
    const doc = dualFabricWithManagement({ name: '', hosts: 2, cardsPerHost: 2, portsPerCard: 2 });
    const hosts = doc.devices.filter((d) => d.kind === 'host').length;
    expect(screen.getByTestId('new-design-preview')).toHaveTextContent(new RegExp(`${hosts} hosts, ${doc.cables.length} cables, ${doc.networks.length} networks`));
    expect(screen.getByTestId('new-design-preview-summary')).toHaveTextContent(new RegExp(`of ${hosts} hosts redundant`));
  });

  it('shows every problem of an imported file with its path and keeps what was typed', async () => {
    const expected = validateTopology(JSON.parse(BROKEN));
    if (expected.ok) throw new Error('the broken file should not validate');
    expect(expected.issues.length).toBeGreaterThanOrEqual(3);
    renderForm(async () => readTopologyText('pier-4.json', BROKEN));
    fireEvent.changeText(screen.getByTestId('new-design-name'), 'Pier 4 cold rooms');
    fireEvent.press(screen.getByTestId('new-design-start-import'));
    fireEvent.press(screen.getByTestId('new-design-file-pick'));
    const issues = await screen.findByTestId('new-design-file-issues');
    expect(issues).toHaveTextContent(/pier-4.json cannot be used/);
    for (const issue of expected.issues) {
      expect(within(issues).getByText(issue.message)).toBeOnTheScreen();
      if (issue.path) expect(within(issues).getAllByText(issue.path).length).toBeGreaterThan(0);
    }
    fireEvent.press(screen.getByTestId('new-design-submit'));
    expect(post).not.toHaveBeenCalled();
    expect(screen.getByTestId('new-design-name').props.value).toBe('Pier 4 cold rooms');
  });

  it('says a file that is not JSON is not JSON', async () => {
    renderForm(async () => readTopologyText('notes.json', 'cam-rec-2 needs a second cable'));
    fireEvent.press(screen.getByTestId('new-design-start-import'));
    fireEvent.press(screen.getByTestId('new-design-file-pick'));
    expect(await screen.findByTestId('new-design-file-issues')).toHaveTextContent(/notes.json is not a JSON file/);
  });

  it('sends an imported document that passes, named after the file when no name was typed', async () => {
    post.mockResolvedValueOnce({ design: { ...harborDesign, id: 8 }, version: null });
    renderForm(async () => readTopologyText('harbor-road-v2.json', JSON.stringify(docs.v2)));
    fireEvent.press(screen.getByTestId('new-design-start-import'));
    fireEvent.press(screen.getByTestId('new-design-file-pick'));
    expect(await screen.findByTestId('new-design-file-preview')).toHaveTextContent(/harbor-road-v2.json passes the checks/);
    expect(screen.getByTestId('new-design-name').props.value).toBe(docs.v2.name);
    fireEvent.changeText(screen.getByTestId('new-design-message'), 'Imported from the Harbor Road plan');
    fireEvent.press(screen.getByTestId('new-design-submit'));
    await waitFor(() =>
      expect(post).toHaveBeenCalledWith('/api/designs', { name: docs.v2.name, document: docs.v2, message: 'Imported from the Harbor Road plan' }),
    );
  });

  it('shows the document issues of a 400 from the server', async () => {
    post.mockRejectedValueOnce(
      new ApiRequestError(400, { error: 'The document is not valid.', issues: [{ path: 'document.devices.0.id', message: 'must not be empty' }] }),
    );
    renderForm(async () => readTopologyText('harbor-road-v2.json', JSON.stringify(docs.v2)));
    fireEvent.press(screen.getByTestId('new-design-start-import'));
    fireEvent.press(screen.getByTestId('new-design-file-pick'));
    await screen.findByTestId('new-design-file-preview');
    fireEvent.press(screen.getByTestId('new-design-submit'));
    const issues = await screen.findByTestId('new-design-server-issues');
    expect(issues).toHaveTextContent(/document.devices.0.id/);
    expect(issues).toHaveTextContent(/must not be empty/);
  });

  it('explains an out-of-range pattern number under its field as soon as it is typed', () => {
    renderForm();
    fireEvent.changeText(screen.getByTestId('new-design-cards'), '5');
    // Before anything is sent: the field says why, and no preview of a design that cannot be built.
    expect(screen.getByTestId('new-design-cards-error')).toHaveTextContent('At most 4 cards per host');
    expect(screen.queryByTestId('new-design-preview')).toBeNull();
    fireEvent.changeText(screen.getByTestId('new-design-cards'), '3');
    expect(screen.queryByTestId('new-design-cards-error')).toBeNull();
    expect(post).not.toHaveBeenCalled();
  });

  it('creates a blank design without a document', async () => {
    post.mockResolvedValueOnce({ design: { ...harborDesign, id: 9 }, version: null });
    renderForm();
    fireEvent.changeText(screen.getByTestId('new-design-name'), 'Loading dock');
    fireEvent.press(screen.getByTestId('new-design-start-blank'));
    fireEvent.press(screen.getByTestId('new-design-submit'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/api/designs', { name: 'Loading dock' }));
  });
});

// The request the form sends, built without rendering (lib/forms reaches the API client, which needs the Expo preset).
describe('new design request', () => {
  const base = { name: 'Pier 4', site: '', message: '', start: 'pattern' as const, pattern: DEFAULT_PATTERN_VALUES, imported: null };

  it('describes each pattern with the shared patterns’ own sentence', () => {
    for (const pattern of PATTERNS) expect(PATTERN_HINTS[pattern.id]).toBe(pattern.about);
  });

  it('builds the pattern document the shared patterns give for the same options', () => {
    const built = buildCreateBody({ ...base, pattern: { ...DEFAULT_PATTERN_VALUES, hosts: '5' } });
    expect(built.body).toEqual({ name: 'Pier 4', document: dualFabric({ name: 'Pier 4', hosts: 5, cardsPerHost: 2, portsPerCard: 2 }) });
  });

  it('refuses counts outside the form limits, a missing file and a missing name together', () => {
    expect(buildCreateBody({ ...base, pattern: { ...DEFAULT_PATTERN_VALUES, cardsPerHost: '5' } }).errors).toEqual({ cardsPerHost: 'At most 4 cards per host' });
    expect(buildCreateBody({ ...base, name: ' ', start: 'import' }).errors).toEqual({
      file: 'Choose a topology file that passes the checks, or start another way',
      name: 'Give the design a name',
    });
  });
});
