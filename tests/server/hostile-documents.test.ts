import { analysisPool } from '@/server/services/analysis';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2 } from './helpers/designs';
import { until, withDeviceId } from './helpers/hostile';

/**
 * Documents whose ids are names every JavaScript object already has, saved through the API. Whatever
 * the analysis makes of them, the server must stay up: the save is analysed (201) or stopped by the
 * analysis limits (422) — never a 500, never a hang — and other requests are answered meanwhile.
 * Whether the report of such a document is right is checked by the analysis' own hostile-id tests.
 */
jest.setTimeout(60_000);
const LIMIT_MS = 3000;

let t: TestApp;
let ravi: Agent;
let id: number;
let log: jest.SpyInstance;
beforeAll(async () => {
  t = await makeTestApp({ env: { ANALYSIS_TIMEOUT_MS: String(LIMIT_MS) } });
  ravi = await signInAs(t.app, 'designer');
  id = await designId(t);
});
afterAll(() => t.close());
beforeEach(() => {
  log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
});
afterEach(() => log.mockRestore());

async function latest(): Promise<number> {
  const row = await t.models.DesignVersion.findOne({ where: { designId: id }, order: [['number', 'DESC']] });
  return row!.number;
}

const CASES = [
  { what: 'an array', device: 'vault-1', id: 'constructor' },
  { what: 'an array', device: 'vault-1', id: 'hasOwnProperty' },
  { what: 'a switch', device: 'fab-a', id: '__proto__' },
  { what: 'a switch', device: 'fab-b', id: 'toString' },
] as const;

describe('saving documents with hostile ids', () => {
  it.each(CASES)('$what with the id $id: saved or refused with 422, other requests answered meanwhile, the server up after', async (c) => {
    let done = false;
    const saving = ravi
      .post(`/api/designs/${id}/versions`)
      .send({ baseVersion: await latest(), message: `Renamed ${c.device} to ${c.id}`, document: withDeviceId(c.device, c.id) })
      .then((res) => {
        done = true;
        return res;
      });
    const pool = analysisPool(t.config.analysis);
    await until(() => pool.stats().running > 0 || done);
    if (!done) {
      const started = Date.now();
      await ravi.get('/api/designs').expect(200);
      // A generous bound on one answer while the hostile document is being analysed, not a benchmark.
      expect(Date.now() - started).toBeLessThan(100);
    }
    const res = await saving;
    // RFC 9110 §15.5.21: 422 when the analysis limits stop it; 201 when the analysis finishes.
    expect([201, 422]).toContain(res.status);
    if (res.status === 422) expect(res.body.error).toMatch(/^The analysis (of this document|stopped|could not finish)/);

    await ravi.get('/api/auth/me').expect(200);
    const plain = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: await latest(), message: 'Plain ids again', document: harborV2() });
    expect(plain.status).toBe(201);
  });

  it('stores a hostile-id document that the analysis finishes, and serves its report', async () => {
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: await latest(), message: 'A switch called toString', document: withDeviceId('fab-b', 'toString') });
    expect(res.status).toBe(201);
    const n = res.body.version.number as number;
    const report = await ravi.get(`/api/designs/${id}/versions/${n}/report`).expect(200);
    expect(report.body.summary).toEqual(res.body.version.summary);
    const read = await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200);
    expect(read.body.version.document.devices.map((d: { id: string }) => d.id)).toContain('toString');
  });
});
