import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { ReportScreen } from '@/components/report/ReportScreen';
import { api } from '@/lib/api/client';
import { createNamer } from '@/lib/report/names';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { loginPlan } from '@/shared/handover/login-plan';
import type { Topology } from '@/shared/topology/schema';
import { designResponse, docs, people, versionDetail, versionSummary } from '../designs/helpers';
import { createTestQueryClient, renderWithClient } from '../helpers/render';
import { handoverKeys } from '@/lib/api/handover';
import { secretKeys } from '@/lib/api/secrets';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

/** The server's answers for version n of Harbor Road: the document and the report of `analyze`. */
function serve(n: 1 | 2, doc: Topology = n === 1 ? docs.v1 : docs.v2) {
  const report = analyze(doc);
  get.mockImplementation(async (path: string) => {
    if (path === `/api/designs/1/versions/${n}/report-page`) {
      return { design: designResponse([versionSummary({ number: n, doc })]).design, version: versionDetail({ number: n, doc }), report, summary: summarize(report, doc) };
    }
    if (path === `/api/designs/1/versions/${n}/login-plan`) return loginPlan(doc);
    if (path === `/api/designs/1/versions/${n}/after-one`) return { afterOneFailure: analyze(doc, { afterOne: true }).afterOneFailure };
    throw new Error(`unexpected request ${path}`);
  });
  return { doc, report };
}

function renderReport(n: 1 | 2, doc?: Topology, { fetchPlan = false } = {}) {
  const served = serve(n, doc);
  const client = createTestQueryClient();
  // The login plan is a query of its own; tests that do not read it get it up front, so it never
  // lands after they have finished (outside act).
  if (!fetchPlan) client.setQueryData(handoverKeys.loginPlan(1, n), loginPlan(served.doc));
  // The secrets card has its own test (secrets-card.test.tsx); here no secrets exist yet.
  client.setQueryData(secretKeys.status(1), { status: { mode: served.doc.security?.chap ?? 'none', generatedAt: null, generatedBy: null, length: null, hosts: [], reveals: [] } });
  renderWithClient(<ReportScreen id={1} n={n} />, { user: people.reviewer, client });
  return served;
}

/** Hosts that reach an array without the failures and reach none of them with: read off analyze itself. */
function cutOffBy(doc: Topology, failed: string[]): string[] {
  const after = new Set(analyze(doc, { failed }).hosts.map((h) => `${h.host}>${h.array}`));
  return analyze(doc).hosts.filter((h) => !after.has(`${h.host}>${h.array}`)).map((h) => h.host);
}

beforeEach(() => get.mockReset());


describe('failure report', () => {
  it('heads the report with the saved summary: redundant hosts of all, errors, warnings, single points', async () => {
    const { doc, report } = renderReport(1);
    const summary = summarize(report, doc);
    const headline = await screen.findByTestId('report-headline');
    expect(within(headline).getByTestId('report-headline-hosts-value')).toHaveTextContent(`${summary.redundantHosts} of ${summary.hosts}`);
    expect(within(headline).getByTestId('report-headline-errors-value')).toHaveTextContent(String(summary.errors));
    expect(within(headline).getByTestId('report-headline-warnings-value')).toHaveTextContent(String(summary.warnings));
    expect(within(headline).getByTestId('report-headline-spof-value')).toHaveTextContent(String(summary.singlePointsOfFailure));
    // docs/demo.md: in version 1 only cam-rec-2 is not redundant, so five of six hosts are.
    expect(summary).toMatchObject({ hosts: 6, redundantHosts: 5 });
    expect(screen.queryByTestId('report-headline-simulated')).toBeNull();
    // The screen's data comes in one request, not one each for the design, the version and the report;
    // the after-one analysis (megabytes on a large design) comes on its own for the maintenance view.
    expect(get.mock.calls.map((c) => c[0]).sort()).toEqual(['/api/designs/1/versions/1/after-one', '/api/designs/1/versions/1/report-page']);
  });

  it("names cam-rec-2's single points of failure by device and port in version 1", async () => {
    const { doc, report } = renderReport(1);
    const row = await screen.findByTestId('report-host-cam-rec-2-spofs');
    const expected = report.hosts.find((h) => h.host === 'cam-rec-2')!.singlePointsOfFailure;
    expect(expected.length).toBeGreaterThan(0);
    const namer = createNamer(doc);
    for (const unit of expected) expect(row).toHaveTextContent(namer.unit(unit), { exact: false });
    // docs/demo.md: cam-rec-2 is cabled only to fab-a, through its first card.
    expect(row).toHaveTextContent(/switch fab-a/);
    expect(row).toHaveTextContent(/card-1 of cam-rec-2/);
    expect(row).toHaveTextContent(/cable HR-A-10 \(cam-rec-2 card-1 p1 → fab-a p\d+\)/);
    expect(screen.getByTestId('report-failure-fab-a')).toHaveTextContent(/Cuts off cam-rec-2 from vault-1/);
  });

  it('lists the management port on a data switch and the single points among the errors of version 1', async () => {
    renderReport(1);
    const errors = await screen.findByTestId('report-findings-error');
    expect(within(errors).getByTestId('report-finding-management-port-on-data-switch')).toHaveTextContent(/ctl-b mgmt/);
    // The finding is headed in words; the rule id stays only as the small code beside it.
    expect(within(errors).getByTestId('report-finding-management-port-on-data-switch-title')).toHaveTextContent('Management port on a data switch');
    expect(within(errors).getAllByTestId('report-finding-single-point-of-failure').length).toBeGreaterThan(0);
  });

  it('shows version 2 with no single point of failure and no management port on a data switch', async () => {
    renderReport(2);
    expect(await screen.findByTestId('report-failures-none')).toBeOnTheScreen();
    expect(screen.queryByTestId('report-finding-management-port-on-data-switch')).toBeNull();
    expect(screen.queryByTestId('report-finding-single-point-of-failure')).toBeNull();
    expect(screen.queryByTestId('report-host-cam-rec-2-spofs')).toBeNull();
  });

  it('recomputes in the browser when fab-a fails in version 1 and names the hosts that lose access', async () => {
    const { doc } = renderReport(1);
    fireEvent.changeText(await screen.findByTestId('whatif-search'), 'fab-a');
    fireEvent.press(screen.getByTestId('whatif-add-fab-a'));
    const impact = await screen.findByTestId('whatif-impact', {}, { timeout: 2000 });
    const lost = cutOffBy(doc, ['fab-a']);
    expect(lost).toEqual(['cam-rec-2']); // docs/demo.md: cam-rec-2 hangs on fab-a alone
    for (const host of lost) expect(within(impact).getByTestId(`whatif-lost-${host}`)).toHaveTextContent(`${host} would lose access to vault-1`);
    expect(screen.getByTestId('report-host-cam-rec-2-lost')).toHaveTextContent('Would lose access');
    const simulated = summarize(analyze(doc, { failed: ['fab-a'] }), doc);
    expect(screen.getByTestId('report-headline-hosts-value')).toHaveTextContent(`${simulated.redundantHosts} of ${simulated.hosts}`);
    expect(screen.getByTestId('report-headline-simulated')).toHaveTextContent('Simulation: switch fab-a failed');
  });

  it('cuts nobody off when fab-a fails in version 2, but says who keeps access with less to spare', async () => {
    const { doc } = renderReport(2);
    fireEvent.changeText(await screen.findByTestId('whatif-search'), 'fab-a');
    fireEvent.press(screen.getByTestId('whatif-add-fab-a'));
    await screen.findByTestId('whatif-impact', {}, { timeout: 2000 });
    expect(cutOffBy(doc, ['fab-a'])).toEqual([]);
    expect(screen.getByTestId('whatif-none-lost')).toBeOnTheScreen();
    // Every host still reaches vault-1, now over fab-b alone: read off analyze, not assumed.
    const before = new Map(analyze(doc).hosts.map((h) => [h.host, h]));
    const after = analyze(doc, { failed: ['fab-a'] }).hosts;
    const lessToSpare = (h: (typeof after)[number]) => !h.redundant || h.sessions < before.get(h.host)!.sessions;
    const reduced = after.filter(lessToSpare).map((h) => h.host);
    expect(reduced.length).toBeGreaterThan(0);
    for (const host of reduced) expect(screen.getByTestId('whatif-reduced')).toHaveTextContent(new RegExp(host));
    for (const h of after.filter((x) => !lessToSpare(x))) expect(screen.getByTestId('whatif-reduced')).not.toHaveTextContent(new RegExp(h.host));
  });

  it('goes back to the saved report on reset', async () => {
    renderReport(1);
    fireEvent.changeText(await screen.findByTestId('whatif-search'), 'fab-a');
    fireEvent.press(screen.getByTestId('whatif-add-fab-a'));
    await screen.findByTestId('whatif-impact', {}, { timeout: 2000 });
    fireEvent.press(screen.getByTestId('whatif-reset'));
    await act(() => new Promise((resolve) => setTimeout(resolve, 400)));
    await waitFor(() => expect(screen.queryByTestId('whatif-impact')).toBeNull(), { timeout: 2000 });
    expect(screen.queryByTestId('report-headline-simulated')).toBeNull();
    expect(screen.queryByTestId('report-host-cam-rec-2-lost')).toBeNull();
  });

  it('finds units to fail by a host name across its cards and cables', async () => {
    renderReport(1);
    fireEvent.changeText(await screen.findByTestId('whatif-search'), 'cam-rec-2 card-1');
    const results = screen.getByTestId('whatif-results');
    expect(within(results).getByTestId('whatif-add-cam-rec-2.card-1')).toBeOnTheScreen();
    expect(within(results).getByTestId('whatif-add-cable-a-10')).toBeOnTheScreen();
    expect(within(results).queryByTestId('whatif-add-fab-b')).toBeNull();
  });

  it('lists a host that reaches no array at all, which the per-pair rows cannot show', async () => {
    // Version 2 with every cable of wms-db-1 pulled: the host keeps its data ports but no path.
    const doc: Topology = { ...docs.v2, cables: docs.v2.cables.filter((c) => !`${c.a} ${c.b}`.includes('wms-db-1.')) };
    const { report } = renderReport(2, doc);
    expect(report.hosts.some((h) => h.host === 'wms-db-1')).toBe(false);
    const row = await screen.findByTestId('report-unreached-wms-db-1');
    expect(row).toHaveTextContent(/No storage access/);
    // The hosts that still reach vault-1 are not listed as unreached.
    expect(screen.queryByTestId('report-unreached-wms-db-2')).toBeNull();
    expect(screen.getByTestId('report-host-wms-db-2')).toBeOnTheScreen();
  });
});

describe('login plan on the report', () => {
  it('shows each host of version 2 with the report’s session count and every portal on port 3260', async () => {
    const { report } = renderReport(2, undefined, { fetchPlan: true });
    expect(await screen.findByText('Failure report: Harbor Road storage, version 2')).toBeOnTheScreen();
    for (const host of ['wms-db-1', 'cam-rec-2']) {
      const sessions = report.hosts.filter((h) => h.host === host).reduce((sum, h) => sum + h.sessions, 0);
      expect(await screen.findByTestId(`login-plan-${host}-sessions`)).toHaveTextContent(`${sessions} sessions expected`);
      const lines = screen.getAllByTestId(new RegExp(`^login-plan-${host}-port-.*-target$`));
      expect(lines).toHaveLength(sessions);
      // iSCSI's registered TCP port is 3260 (RFC 7143 §15); vault-1's target name is the demo's.
      for (const line of lines) expect(line).toHaveTextContent(/^\d+\.\d+\.\d+\.\d+:3260 → iqn\.2026-01\.example\.tidewater:storage\.vault-1 /);
    }
  });
});
