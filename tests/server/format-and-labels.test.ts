import { TOPOLOGY_FORMAT, TOPOLOGY_FORMAT_1, type Topology } from '@/shared/topology/schema';
import oldV2 from '@/tests/shared/data/harbor-road-v2.format-1.json';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveOnTop } from './helpers/designs';

/**
 * The server reads every stored format and writes format 2; the stored text of a version is never
 * rewritten. Cable labels stay stable across saves (shared/labels/stable.ts).
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

const document = async (n: number): Promise<Topology> => (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).body.version.document;
const storedText = async (n: number): Promise<string> => (await t.models.DesignVersion.findOne({ where: { designId: id, number: n } }))!.document;

describe('formats on the server', () => {
  it('saves a format 1 body as format 2', async () => {
    const res = await saveOnTop(ravi, id, structuredClone(oldV2));
    expect(res.status).toBe(201);
    expect((await document(3)).format).toBe(TOPOLOGY_FORMAT);
    expect(JSON.parse(await storedText(3)).format).toBe(TOPOLOGY_FORMAT);
  });

  it('answers a version stored as format 1 in format 2, and leaves the stored text as it was', async () => {
    // A version stored before format 2: written straight into the table, as an older server did.
    const v2 = (await t.models.DesignVersion.findOne({ where: { designId: id, number: 2 } }))!;
    const old = JSON.stringify(oldV2);
    await t.models.DesignVersion.create({
      designId: id, number: 3, document: old, message: 'Stored as format 1', authorId: v2.authorId,
      summary: v2.summary, contentHash: v2.contentHash, createdAt: new Date(),
    });
    const doc = await document(3);
    expect(doc.format).toBe(TOPOLOGY_FORMAT);
    expect(doc.devices.every((d) => !('rack' in d))).toBe(true);
    expect((await ravi.get(`/api/designs/${id}/versions/3/report`).expect(200)).body.report.hosts).toHaveLength(6);
    expect((await ravi.get(`/api/designs/${id}/versions/3/cables`).expect(200)).body.cables).toHaveLength(28);
    expect(await storedText(3)).toBe(old);
    expect(JSON.parse(await storedText(3)).format).toBe(TOPOLOGY_FORMAT_1);
  });
});

describe('cable labels on save', () => {
  it('keeps every label when a version changes one cable and sends no labels at all', async () => {
    const doc = harborV2();
    const before = new Map(doc.cables.map((c) => [c.id, c.label]));
    doc.cables[3].lengthM = 9;
    for (const cable of doc.cables) delete cable.label;
    expect((await saveOnTop(ravi, id, doc)).status).toBe(201);
    const saved = await document(3);
    expect(new Map(saved.cables.map((c) => [c.id, c.label]))).toEqual(before);
  });

  it('never hands a removed cable’s label to a new cable in a later version, and numbers on in the fabric', async () => {
    const v3 = harborV2();
    const removed = v3.cables.find((c) => c.label === 'HR-A-10')!;
    v3.cables = v3.cables.filter((c) => c !== removed);
    expect((await saveOnTop(ravi, id, v3)).status).toBe(201);
    const v4 = structuredClone(v3);
    v4.cables.push({ id: 'cable-late', label: 'HR-A-10', a: removed.a, b: 'fab-a.p12', media: 'cat6a', lengthM: 5 });
    v4.cables.push({ id: 'cable-later', a: 'wms-db-1.card-1.p2', b: 'fab-a.p11', media: 'cat6a', lengthM: 5 });
    expect((await saveOnTop(ravi, id, v4)).status).toBe(201);
    const saved = await document(4);
    const label = (cableId: string) => saved.cables.find((c) => c.id === cableId)!.label;
    expect([label('cable-late'), label('cable-later')]).toEqual(['HR-A-11', 'HR-A-12']);
    // Restoring the version that still had the cable gives it back its own label.
    await ravi.post(`/api/designs/${id}/versions/2/restore`).send({ message: 'Back to v2' }).expect(201);
    expect((await document(5)).cables.find((c) => c.id === removed.id)!.label).toBe('HR-A-10');
  });
});
