import request from 'supertest';
import { makeTestApp, signInAs, type Agent, type DemoWho, type TestApp } from './helpers/app';
import { designId } from './helpers/designs';

/**
 * GET /api/designs/:id/versions/:n/login-plan (docs/api.md) on the seeded demo: Harbor Road v1 (changes
 * asked) and v2 (approved), Tidewater's; Sam is on another team.
 */
let t: TestApp;
let id: number;
const agents = new Map<DemoWho, Agent>();
beforeAll(async () => {
  t = await makeTestApp();
  id = await designId(t);
  for (const who of ['admin', 'designer', 'reviewer', 'installer', 'otherTeam'] as const) agents.set(who, await signInAs(t.app, who));
});
afterAll(() => t.close());

const url = (n: number | string) => `/api/designs/${id}/versions/${n}/login-plan`;

it('follows the role table: the team, installers approved versions only, another team 404', async () => {
  expect((await request(t.app).get(url(2))).status).toBe(401);
  for (const who of ['admin', 'designer', 'reviewer'] as const) expect((await agents.get(who)!.get(url(1))).status).toBe(200);
  expect((await agents.get('installer')!.get(url(2))).status).toBe(200);
  expect((await agents.get('installer')!.get(url(1))).status).toBe(404);
  expect((await agents.get('otherTeam')!.get(url(2))).status).toBe(404);
  const bad = await agents.get('designer')!.get(url('two'));
  expect(bad.status).toBe(400);
});

it('gives every host of version 2 the session count of the stored report, each portal on port 3260', async () => {
  const ines = agents.get('installer')!;
  const plan = (await ines.get(url(2)).expect(200)).body as { hosts: { host: string; expectedSessions: number; ports: { targets: { portal: string; controller: string }[] }[] }[] };
  const report = (await ines.get(`/api/designs/${id}/versions/2/report`).expect(200)).body.report as { hosts: { host: string; sessions: number }[] };
  const perHost = new Map<string, number>();
  for (const pair of report.hosts) perHost.set(pair.host, (perHost.get(pair.host) ?? 0) + pair.sessions);
  expect(plan.hosts).toHaveLength(perHost.size);
  for (const host of plan.hosts) {
    expect(host.expectedSessions).toBe(perHost.get(host.host));
    const portals = host.ports.flatMap((p) => p.targets.map((x) => x.portal));
    expect(portals).toHaveLength(host.expectedSessions);
    for (const portal of portals) expect(portal.endsWith(':3260')).toBe(true); // RFC 7143 §15: iSCSI on TCP 3260
  }
});
