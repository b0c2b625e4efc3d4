import ipaddr from 'ipaddr.js';
import type { Sequelize } from 'sequelize';
import { openDatabase } from '@/server/db';
import { migrate } from '@/server/migrate';
import { getModels } from '@/server/models';
import { seedDemo } from '@/server/seed';
import { createPasswords } from '@/server/services/passwords';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2, QUAYSIDE_LAB } from './helpers/designs';

/** The seeded demo scenario (docs/demo.md): what every role sees on first sign-in. */
let t: TestApp;
let theo: Agent;
let id: number;
beforeAll(async () => {
  t = await makeTestApp();
  theo = await signInAs(t.app, 'reviewer');
  id = await designId(t);
});
afterAll(() => t.close());

type Event = { action: string; actor: { name: string }; comment: string | null; createdAt: string };
type Version = { number: number; message: string; author: { name: string }; createdAt: string; review: { state: string; events: Event[] } };

describe('the seeded Harbor Road design', () => {
  it('has v1 sent back by Theo and v2 approved by Theo, both by Ravi, in time order', async () => {
    const res = await theo.get(`/api/designs/${id}`).expect(200);
    expect(res.body.design).toMatchObject({ name: 'Harbor Road storage', site: 'Harbor Road server room', status: 'approved', createdBy: { name: 'Ravi Menon' } });
    const [v2, v1] = res.body.versions as Version[];
    expect(v1.message).toMatch(/first layout/i);
    expect(v1.review.events.map((e) => [e.action, e.actor.name])).toEqual([
      ['submit', 'Ravi Menon'],
      ['request-changes', 'Theo Brandt'],
    ]);
    const ask = v1.review.events[1].comment ?? '';
    expect(ask).toMatch(/cam-rec-2 is cabled only to fab-a/);
    expect(ask).toMatch(/management port of vault-1's ctl-b is plugged into data switch fab-b/);
    expect(v2.review.events.map((e) => [e.action, e.actor.name])).toEqual([
      ['submit', 'Ravi Menon'],
      ['approve', 'Theo Brandt'],
    ]);
    expect([v1.author.name, v2.author.name]).toEqual(['Ravi Menon', 'Ravi Menon']);
    const times = [v1.createdAt, ...v1.review.events.map((e) => e.createdAt), v2.createdAt, ...v2.review.events.map((e) => e.createdAt)].map(Date.parse);
    expect([...times].sort((a, b) => a - b)).toEqual(times);
    expect(Math.max(...times)).toBeLessThan(Date.now());
  });

  it('stores the two demo documents as they are in shared/fixtures', async () => {
    expect((await theo.get(`/api/designs/${id}/versions/1`).expect(200)).body.version.document).toEqual(harborV1());
    expect((await theo.get(`/api/designs/${id}/versions/2`).expect(200)).body.version.document).toEqual(harborV2());
  });

  it('reports v1’s flaws: cam-rec-2 with single points of failure and a management port on a data switch', async () => {
    const { report, summary } = (await theo.get(`/api/designs/${id}/versions/1/report`).expect(200)).body;
    const camRec2 = report.hosts.find((h: { host: string }) => h.host === 'cam-rec-2');
    expect(camRec2.redundant).toBe(false);
    // Cabled only to fab-a: that switch, the one cabled card and its cable each cut it off (docs/demo.md's flaw).
    expect(camRec2.singlePointsOfFailure).toEqual(expect.arrayContaining(['fab-a', 'cam-rec-2.card-1']));
    const mgmt = report.findings.find((f: { rule: string }) => f.rule === 'management-port-on-data-switch');
    // Management ports belong on an out-of-band network, never on a data switch (docs/demo.md; common practice).
    expect(mgmt).toMatchObject({ severity: 'error', subjects: expect.arrayContaining(['vault-1.ctl-b.mgmt', 'fab-b']) });
    expect(summary).toMatchObject({ hosts: 6, redundantHosts: 5 });
    expect(summary.singlePointsOfFailure).toBeGreaterThan(0);
    expect(summary.errors).toBeGreaterThan(0);
  });

  it('reports v2 clean: every host redundant, no single point of failure, no errors', async () => {
    const { report, summary } = (await theo.get(`/api/designs/${id}/versions/2/report`).expect(200)).body;
    expect(report.hosts.every((h: { redundant: boolean; singlePointsOfFailure: string[] }) => h.redundant && h.singlePointsOfFailure.length === 0)).toBe(true);
    expect(report.failures).toEqual([]);
    expect(report.findings.filter((f: { severity: string }) => f.severity === 'error')).toEqual([]);
    expect(summary).toMatchObject({ errors: 0, singlePointsOfFailure: 0, hosts: 6, redundantHosts: 6 });
  });
});

describe('the seeded Quayside design', () => {
  it('is Sam’s draft with one version, on documentation addresses only', async () => {
    const sam = await signInAs(t.app, 'otherTeam');
    const [design] = (await sam.get('/api/designs').expect(200)).body.designs;
    expect(design).toMatchObject({ name: QUAYSIDE_LAB, status: 'draft', latestVersion: { number: 1, review: 'draft' } });
    const { version } = (await sam.get(`/api/designs/${design.id}/versions/1`).expect(200)).body;
    expect(version.author.name).toBe('Sam Whitlock');
    const ips = JSON.stringify(version.document).match(/"ip":"([^"]+)"/g)?.map((m) => m.slice(6, -1)) ?? [];
    expect(ips.length).toBeGreaterThan(0);
    // RFC 5737 §3: the three IPv4 documentation blocks.
    const docBlocks = ['192.0.2.0/24', '198.51.100.0/24', '203.0.113.0/24'];
    for (const ip of ips) expect([ip, docBlocks.some((b) => ipaddr.parse(ip).match(ipaddr.parseCIDR(b)))]).toEqual([ip, true]);
  });
});

describe('seeding the designs', () => {
  let db: Sequelize;
  beforeEach(async () => {
    db = await openDatabase(':memory:');
    await migrate(db);
  });
  afterEach(() => db.close());

  it('writes nothing at all when a step fails: people and designs are one transaction', async () => {
    const { ReviewEvent, User, Design, DesignVersion } = getModels(db);
    const create = jest.spyOn(ReviewEvent, 'create').mockRejectedValueOnce(new Error('disk full'));
    await expect(seedDemo(db, createPasswords(4))).rejects.toThrow('disk full');
    create.mockRestore();
    expect([await User.count(), await Design.count(), await DesignVersion.count()]).toEqual([0, 0, 0]);
    expect((await seedDemo(db, createPasswords(4))).seeded).toBe(true);
    expect(await Design.count()).toBe(2);
  });

  it('does not add the designs a second time', async () => {
    await seedDemo(db, createPasswords(4));
    await seedDemo(db, createPasswords(4));
    expect([await getModels(db).Design.count(), await getModels(db).DesignVersion.count()]).toEqual([2, 3]);
  });
});
