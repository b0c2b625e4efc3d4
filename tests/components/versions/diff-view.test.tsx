import { screen, within } from '@testing-library/react-native';
import { DiffScreen } from '@/components/versions/DiffScreen';
import { api } from '@/lib/api/client';
import { diffTopologies } from '@/shared/diff';
import { designResponse, docs, versionSummary } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

/** Harbor Road 1 → 2 as the diff route answers it: the shared diff of the two demo documents. */
function serve() {
  const diff = diffTopologies(docs.v1, docs.v2);
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1') return designResponse([versionSummary({ number: 2, doc: docs.v2 }), versionSummary({ number: 1, doc: docs.v1 })]);
    if (path === '/api/designs/1/versions/2/diff?against=1') return { diff };
    throw new Error(`unexpected request ${path}`);
  });
  return diff;
}

beforeEach(() => get.mockReset());

describe('diff view', () => {
  it('asks the diff route for "from 1 to 2" and heads the page with the count of differences', async () => {
    const diff = serve();
    renderWithClient(<DiffScreen id={1} from={1} to={2} onPick={jest.fn()} />);
    expect(await screen.findByTestId('diff-headline')).toHaveTextContent(`${diff.counts.total} differences.`);
    expect(get).toHaveBeenCalledWith('/api/designs/1/versions/2/diff?against=1');
  });

  it("shows cam-rec-2's new fab-b cable as added and the moved management cable as changed", async () => {
    const diff = serve();
    renderWithClient(<DiffScreen id={1} from={1} to={2} onPick={jest.fn()} />);
    const cables = await screen.findByTestId('diff-cables');
    // docs/demo.md: version 2 cables cam-rec-2 card-2 to fab-b and moves ctl-b's management port to oob-1.
    const added = diff.cables.added.find((c) => c.changes.some((f) => String(f.after).includes('cam-rec-2')));
    const moved = diff.cables.changed.find((c) => c.changes.some((f) => String(f.after).includes('oob-1')));
    expect(added && moved).toBeTruthy();
    const addedRow = within(cables).getByTestId(`diff-cables-added-${added!.id}`);
    expect(addedRow).toHaveTextContent(/Added/);
    expect(addedRow).toHaveTextContent(/cam-rec-2 \/ card-2 p1/);
    const movedRow = within(cables).getByTestId(`diff-cables-changed-${moved!.id}`);
    expect(movedRow).toHaveTextContent(/Changed/);
    expect(movedRow).toHaveTextContent(/→ oob-1/);
  });

  it('lists the document-level change and leaves out sections with nothing in them', async () => {
    const diff = serve();
    renderWithClient(<DiffScreen id={1} from={1} to={2} onPick={jest.fn()} />);
    await screen.findByTestId('diff-headline');
    // docs/demo.md: version 2 turns on mutual CHAP.
    expect(screen.getByTestId('diff-document')).toHaveTextContent(/CHAP: none → mutual/);
    for (const section of ['devices', 'groups', 'ports', 'networks', 'addresses'] as const) {
      const counts = diff.counts[section];
      const shown = screen.queryByTestId(`diff-${section}`);
      if (counts.added + counts.removed + counts.changed === 0) expect(shown).toBeNull();
      else expect(shown).toBeOnTheScreen();
    }
  });

  it('says there is nothing to compare for a design with one version', async () => {
    get.mockImplementation(async () => designResponse([versionSummary({ number: 1, doc: docs.v1 })]));
    renderWithClient(<DiffScreen id={1} from={null} to={null} onPick={jest.fn()} />);
    expect(await screen.findByText('This design has only one version, so there is nothing to compare yet.')).toBeOnTheScreen();
  });
});
