import { analysisPool } from '@/server/services/analysis';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2 } from './helpers/designs';
import { until, withDeviceId } from './helpers/hostile';
import { quickestGet } from './helpers/timing';

/**
 * Documents whose ids are names every JavaScript object already has, saved through the API. The
 * analysis keeps ids out of plain objects (tests/shared/hostile-documents.test.ts), so each is saved
 * (201) with the very summary of the same design under plain ids — never a 422 from a disturbed
 * analysis process, never a 500 or a hang — and other requests are answered meanwhile.
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
  it.each(CASES)('$what with the id $id: saved with the plain design\'s summary, other requests answered meanwhile, the server up after', async (c) => {
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
    const during = done ? null : await quickestGet(ravi, '/api/designs');
    const res = await saving;
    // Answered while the hostile document was being analysed (when the analysis had not already finished).
    if (during) expect(during).toEqual({ status: 200, ms: expect.any(Number) });
    if (during) expect(during.ms).toBeLessThan(100);
    expect([res.status, res.body.error]).toEqual([201, undefined]);

    await ravi.get('/api/auth/me').expect(200);
    const plain = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: await latest(), message: 'Plain ids again', document: harborV2() });
    expect(plain.status).toBe(201);
    // Renaming one id changes no path, unit or finding count: the two summaries agree.
    expect(res.body.version.summary).toEqual(plain.body.version.summary);
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
