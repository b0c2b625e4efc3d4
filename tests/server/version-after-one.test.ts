import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import type { Topology } from '@/shared/topology/schema';
import { contentHash } from '@/server/services/designs/canonical';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveOnTop } from './helpers/designs';

/**
 * afterOneFailure (docs/api.md `--after-one`) is computed in the analysis process when a version is saved
 * and stored beside its report; GET …/after-one serves it. A version stored without it is analysed
 * on request, and nothing is written to the old row.
 */
let t: TestApp;
let ravi: Agent;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  ravi = await signInAs(t.app, 'designer');
  id = await designId(t);
});
afterEach(() => t.close());

/** Harbor Road v2 with two feeds, every device on both, except fab-b whose two PSUs share Feed A. */
function powered(): Topology {
  const doc = harborV2();
  doc.powerFeeds = [
    { id: 'feed-a', name: 'Feed A' },
    { id: 'feed-b', name: 'Feed B' },
  ];
  for (const device of doc.devices) {
    device.psus = [
      { id: `${device.id}.psu1`, name: 'PSU 1', feedId: 'feed-a' },
      { id: `${device.id}.psu2`, name: 'PSU 2', feedId: device.id === 'fab-b' ? 'feed-a' : 'feed-b' },
    ];
  }
  return doc;
}

async function storedAfterOne(number: number): Promise<string | null> {
  const row = await t.models.DesignVersion.findOne({ where: { designId: id, number }, attributes: ['id', 'afterOne'] });
  return row!.afterOne;
}

describe('after-one failure stored with versions', () => {
  it('stores afterOneFailure with a saved version and serves it', async () => {
    const doc = powered();
    const saved = await saveOnTop(ravi, id, doc, 'Feeds and supplies recorded');
    expect(saved.status).toBe(201);
    const n = saved.body.version.number;
    const expected = analyze(doc, { afterOne: true }).afterOneFailure!;
    expect(JSON.parse((await storedAfterOne(n))!)).toEqual(expected);
    const res = await ravi.get(`/api/designs/${id}/versions/${n}/after-one`).expect(200);
    expect(res.body.afterOneFailure).toEqual(expected);
    // fab-b's supplies share Feed A: with Feed A down fab-b is off, and every host hangs on fab-a.
    const feedA = res.body.afterOneFailure.find((e: { failed: string }) => e.failed === 'feed-a');
    expect(feedA.cutOff).toEqual([]);
    expect(feedA.exposed.length).toBe(6);
    for (const pair of feedA.exposed) expect(pair.singlePointsOfFailure).toEqual(expect.arrayContaining(['fab-a', 'fab-a.psu2', 'feed-b']));
    // The report itself stays as it was: afterOneFailure is served apart.
    const report = await ravi.get(`/api/designs/${id}/versions/${n}/report`).expect(200);
    expect('afterOneFailure' in report.body.report).toBe(false);
  });

  it('computes it for a version stored without it, and writes nothing back', async () => {
    const doc = powered();
    await t.models.DesignVersion.create({
      designId: id,
      number: 3,
      document: JSON.stringify(doc),
      message: 'Version 3',
      authorId: (await t.models.User.findOne({ where: { email: 'ravi@tidewater.example' } }))!.id,
      summary: JSON.stringify(summarize(analyze(doc), doc)),
      contentHash: contentHash(doc),
      report: null,
      afterOne: null,
      createdAt: new Date(),
    });
    const res = await ravi.get(`/api/designs/${id}/versions/3/after-one`).expect(200);
    expect(res.body.afterOneFailure).toEqual(analyze(doc, { afterOne: true }).afterOneFailure);
    expect(await storedAfterOne(3)).toBeNull();
  });

  it('answers 404 for a version that does not exist and 400 for a malformed number', async () => {
    await ravi.get(`/api/designs/${id}/versions/99/after-one`).expect(404);
    const bad = await ravi.get(`/api/designs/${id}/versions/first/after-one`).expect(400);
    expect(bad.body.issues[0].path).toMatch(/n/);
  });
});
