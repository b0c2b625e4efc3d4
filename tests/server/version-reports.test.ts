import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { contentHash } from '@/server/services/designs/canonical';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2, saveOnTop } from './helpers/designs';

/**
 * The report is computed once, when a version is saved, and stored with it (versions never change);
 * GET …/report serves the stored text. Versions stored before reports were kept have none: their
 * report is computed on request in the analysis pool, and nothing is written to the old row.
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

async function storedReport(number: number): Promise<string | null> {
  const row = await t.models.DesignVersion.findOne({ where: { designId: id, number }, attributes: ['id', 'report'] });
  return row!.report;
}

/** Insert a version row as an older server (or a crafted one) would have written it. */
async function insertVersion(number: number, document: object, report: string | null) {
  const doc = document as Parameters<typeof analyze>[0];
  await t.models.DesignVersion.create({
    designId: id,
    number,
    document: JSON.stringify(doc),
    message: `Version ${number}`,
    authorId: (await t.models.User.findOne({ where: { email: 'ravi@tidewater.example' } }))!.id,
    summary: JSON.stringify(summarize(analyze(doc), doc)),
    contentHash: contentHash(doc),
    report,
    createdAt: new Date(),
  });
}

describe('reports stored with versions', () => {
  it('stores the full report with a saved version, equal to the analysis of its document', async () => {
    const doc = harborV1();
    const saved = await saveOnTop(ravi, id, doc, 'Back to the first layout');
    expect(saved.status).toBe(201);
    expect(JSON.parse((await storedReport(saved.body.version.number))!)).toEqual(analyze(doc));
  });

  it('serves GET …/report from the stored text, not from a new analysis', async () => {
    const doc = harborV2();
    const report = analyze(doc);
    // A stored report that differs from what the analysis would say: only reading it back can answer it.
    const marked = { ...report, findings: [...report.findings, { rule: 'stored-marker', severity: 'info', subjects: [], message: 'read from storage' }] };
    await insertVersion(3, doc, JSON.stringify(marked));
    const res = await ravi.get(`/api/designs/${id}/versions/3/report`).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.report).toEqual(marked);
    expect(res.body.summary).toEqual(summarize(report, doc));
  });

  it('computes the report of a version stored without one, and writes nothing to that row', async () => {
    const doc = harborV1();
    await insertVersion(3, doc, null);
    const res = await ravi.get(`/api/designs/${id}/versions/3/report`).expect(200);
    expect(res.body.report).toEqual(analyze(doc));
    expect(res.body.summary).toEqual(summarize(analyze(doc), doc));
    expect(await storedReport(3)).toBeNull();
    await ravi.get(`/api/designs/${id}/versions/3/report`).expect(200);
    expect(await storedReport(3)).toBeNull();
  });

  it('keeps the immutability rule for the new column: the database refuses to fill in a report later', async () => {
    await insertVersion(3, harborV1(), null);
    // The trigger's RAISE(ABORT) reaches Sequelize as a constraint error carrying SQLite's message.
    await expect(t.sequelize.query(`UPDATE design_versions SET report = '{}' WHERE number = 3`)).rejects.toMatchObject({
      parent: { message: expect.stringMatching(/rows are immutable/) },
    });
    expect(await storedReport(3)).toBeNull();
  });

  it('stores the report of a restored version too', async () => {
    const restored = await ravi.post(`/api/designs/${id}/versions/1/restore`).send({ message: 'Back to the first layout' }).expect(201);
    expect(JSON.parse((await storedReport(restored.body.version.number))!)).toEqual(analyze(harborV1()));
  });
});
