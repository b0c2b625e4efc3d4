import { fireEvent, screen, within } from '@testing-library/react-native';
import { ReportScreen } from '@/components/report/ReportScreen';
import { api } from '@/lib/api/client';
import { createNamer } from '@/lib/report/names';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { designResponse, docs, people, versionDetail, versionSummary } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

/** Version 2 of Harbor Road as the server answers it, afterOneFailure included. */
function serve() {
  const doc = docs.v2;
  const report = analyze(doc);
  const afterOneFailure = analyze(doc, { afterOne: true }).afterOneFailure!;
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1/versions/2/report-page') {
      return { design: designResponse([versionSummary({ number: 2, doc })]).design, version: versionDetail({ number: 2, doc }), report, summary: summarize(report, doc) };
    }
    if (path === '/api/designs/1/versions/2/after-one') return { afterOneFailure };
    if (path === '/api/designs/1/versions/2/login-plan') return { hosts: [] };
    throw new Error(`unexpected request ${path}`);
  });
  return { doc, afterOneFailure };
}

beforeEach(() => get.mockReset());

describe('maintenance view', () => {
  it('lists the units that expose the most hosts first and, for fab-a, what each host hangs on', async () => {
    const { doc, afterOneFailure } = serve();
    renderWithClient(<ReportScreen id={1} n={2} />, { user: people.reviewer });
    const card = await screen.findByTestId('report-maintenance');
    const fabA = afterOneFailure.find((e) => e.failed === 'fab-a')!;
    const hosts = new Set(fabA.exposed.map((p) => p.host));
    // With fab-a down in version 2 every host is left on fab-b alone (product.md: six hosts, all redundant).
    expect(hosts.size).toBe(6);
    const most = Math.max(...afterOneFailure.map((e) => new Set(e.exposed.map((p) => p.host)).size));
    const first = within(card).getAllByText(/^Take down /)[0];
    expect(most).toBe(6);
    expect(first).toHaveTextContent(/^Take down switch fab-/);
    fireEvent.press(within(card).getByTestId('maintenance-toggle-fab-a'));
    const namer = createNamer(doc);
    for (const pair of fabA.exposed) {
      const row = screen.getByTestId(`maintenance-host-fab-a-${pair.host}`);
      // The switch first, then the card, then the cable: the biggest thing a host hangs on leads.
      const kinds = ['switch', 'adapter', 'cable'];
      const ordered = [...pair.singlePointsOfFailure].sort((x, y) => kinds.indexOf(namer.kindOf(x)!) - kinds.indexOf(namer.kindOf(y)!));
      expect(within(row).getByText(`exposed through ${ordered.map(namer.unit).join(', ')}`)).toBeOnTheScreen();
      expect(pair.singlePointsOfFailure).toContain('fab-b');
    }
  });

  it('shows, in the what-if, who is one failure from losing storage after the chosen failures', async () => {
    const { doc } = serve();
    renderWithClient(<ReportScreen id={1} n={2} />, { user: people.reviewer });
    fireEvent.changeText(await screen.findByTestId('whatif-search'), 'fab-a');
    fireEvent.press(screen.getByTestId('whatif-add-fab-a'));
    const exposed = await screen.findByTestId('whatif-exposed', {}, { timeout: 2000 });
    const expected = analyze(doc, { failed: ['fab-a'] }).hosts.filter((h) => !h.redundant);
    expect(expected.length).toBe(6);
    for (const pair of expected) expect(within(exposed).getByTestId(`whatif-exposed-${pair.host}`)).toHaveTextContent(/switch fab-b/);
  });
});
