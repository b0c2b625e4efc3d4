import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2, saveOnTop, type Issue } from './helpers/designs';

let t: TestApp;
let ravi: Agent;
let maya: Agent;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  [ravi, maya] = await Promise.all([signInAs(t.app, 'designer'), signInAs(t.app, 'admin')]);
  id = await designId(t);
});
afterEach(() => t.close());

const version = async (n: number) => (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).body.version;
const paths = (body: { issues?: Issue[] }) => (body.issues ?? []).map((i) => i.path);

describe('reading a version', () => {
  it('answers its document, metadata, stored summary and review thread', async () => {
    const v2 = await version(2);
    expect(v2.document).toEqual(harborV2());
    expect(v2).toMatchObject({ number: 2, author: { name: 'Ravi Menon' }, review: { state: 'approved' }, summary: { errors: 0, hosts: 6, redundantHosts: 6 } });
    expect(v2.contentHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('answers the full report, computed from the stored document, with its summary', async () => {
    const res = await ravi.get(`/api/designs/${id}/versions/1/report`).expect(200);
    expect(Object.keys(res.body).sort()).toEqual(['report', 'summary']);
    expect(Object.keys(res.body.report).sort()).toEqual(['failures', 'findings', 'hosts']);
    expect(res.body.summary).toEqual((await version(1)).summary);
  });

  it('answers 404 for a version number the design does not have, and 400 for one that is not a number', async () => {
    const missing = await ravi.get(`/api/designs/${id}/versions/9`);
    // RFC 9110 §15.5.5: 404 Not Found; §15.5.1: 400 Bad Request for a malformed path parameter.
    expect(missing.status).toBe(404);
    expect(missing.body.error).toBe('This design has no version 9.');
    const bad = await ravi.get(`/api/designs/${id}/versions/first`);
    expect(bad.status).toBe(400);
    expect(paths(bad.body)).toEqual(['params.n']);
  });
});

describe('restoring a version', () => {
  it('makes a new version on top of the latest with the old document, and leaves the old ones as they were', async () => {
    const before = [await version(1), await version(2)];
    const res = await maya.post(`/api/designs/${id}/versions/1/restore`).send({ message: 'Back to the first layout for the cost comparison' });
    // RFC 9110 §15.3.2: 201 Created — a new version, nothing changed in place.
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({
      number: 3,
      message: 'Back to the first layout for the cost comparison',
      author: { name: 'Maya Okafor' },
      contentHash: before[0].contentHash,
      summary: before[0].summary,
      review: { state: 'draft', events: [] },
    });
    expect((await version(3)).document).toEqual(harborV1());
    expect([await version(1), await version(2)]).toEqual(before);
    // A restored draft does not move the design's status: v2 is still the latest reviewed version.
    expect((await ravi.get(`/api/designs/${id}`).expect(200)).body.design.status).toBe('approved');
  });

  it('lands on top of versions saved since, without a base check', async () => {
    expect((await saveOnTop(ravi, id, harborV2(), 'Longer cables')).status).toBe(201);
    const res = await ravi.post(`/api/designs/${id}/versions/2/restore`).send({ message: 'Undo the longer cables' });
    expect(res.status).toBe(201);
    expect(res.body.version.number).toBe(4);
  });

  it('needs a message, and answers 404 for a version that does not exist', async () => {
    const bare = await ravi.post(`/api/designs/${id}/versions/1/restore`).send({});
    // RFC 9110 §15.5.1: 400 Bad Request.
    expect(bare.status).toBe(400);
    expect(paths(bare.body)).toEqual(['message']);
    await ravi.post(`/api/designs/${id}/versions/7/restore`).send({ message: 'x' }).expect(404);
    expect(await t.models.DesignVersion.count({ where: { designId: id } })).toBe(2);
  });
});

describe('the diff between two versions', () => {
  it('reads from `against` to `n`: version 1 → 2 adds cam-rec-2’s fabric B cable and moves the management cable', async () => {
    const { diff } = (await ravi.get(`/api/designs/${id}/versions/2/diff`).query({ against: 1 }).expect(200)).body;
    expect(diff.empty).toBe(false);
    expect(diff.cables.added.map((c: { name: string }) => c.name)).toEqual(['HR-B-10']);
    expect(diff.cables.added[0].changes).toEqual(expect.arrayContaining([{ field: 'a', before: null, after: 'cam-rec-2 / card-2 p1' }]));
    expect(diff.cables.changed).toEqual([{ id: 'cable-m-02', name: 'HR-M-02', changes: [{ field: 'b', before: 'fab-b / p10', after: 'oob-1 / p2' }] }]);
    expect(diff.document).toEqual([{ field: 'security.chap', before: 'none', after: 'mutual' }]);
    expect(diff.devices).toEqual({ added: [], removed: [], changed: [] });
  });

  it('turns around when the versions are swapped: 2 → 1 removes the cable again', async () => {
    const { diff } = (await ravi.get(`/api/designs/${id}/versions/1/diff?against=2`).expect(200)).body;
    expect(diff.cables.removed.map((c: { name: string }) => c.name)).toEqual(['HR-B-10']);
    expect(diff.cables.added).toEqual([]);
    expect(diff.document).toEqual([{ field: 'security.chap', before: 'mutual', after: 'none' }]);
  });

  it('is empty between a version and itself, and between a version and its restored copy', async () => {
    expect((await ravi.get(`/api/designs/${id}/versions/2/diff?against=2`).expect(200)).body.diff.empty).toBe(true);
    await ravi.post(`/api/designs/${id}/versions/1/restore`).send({ message: 'Again' }).expect(201);
    expect((await ravi.get(`/api/designs/${id}/versions/3/diff?against=1`).expect(200)).body.diff.empty).toBe(true);
  });

  it('answers 404 for a missing `against` version and 400 for a missing or malformed one', async () => {
    const missing = await ravi.get(`/api/designs/${id}/versions/2/diff?against=9`);
    // RFC 9110 §15.5.5 404 for a version that is not there; §15.5.1 400 for a query that is not a version number.
    expect(missing.status).toBe(404);
    expect(missing.body.error).toBe('This design has no version 9.');
    for (const query of ['', '?against=one', '?against=0', '?against=1&extra=2']) {
      const res = await ravi.get(`/api/designs/${id}/versions/2/diff${query}`);
      expect([query, res.status]).toEqual([query, 400]);
      expect(paths(res.body)[0]).toMatch(/^query/);
    }
  });
});
