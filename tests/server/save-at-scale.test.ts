import { analysisPool } from '@/server/services/analysis';
import { BODY_LIMIT_BYTES } from '@/server/middleware/errors';
import { compactDesign } from './helpers/compact-design';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId } from './helpers/designs';
import { until } from './helpers/hostile';
import { quickestGet } from './helpers/timing';

/**
 * A 20,000-host save through the API: its body is parsed, checked, validated and analysed in an
 * analysis process (server/analysis/tasks.ts `prepareSave`), so while it runs the server answers
 * other requests in milliseconds; the report stored with the version is served without analysing
 * again. The same document past a memory limit is refused with a sentence and the server stays up.
 */
jest.setTimeout(180_000);
const HOSTS = 20_000;
/**
 * The body as text, made once: the test runs in the server's process, and holding the document as
 * objects would give that process a heap of millions of objects (and its collector's pauses) that
 * the real server never has, since it never parses a save's body itself.
 */
const { BODY, DEVICES } = (() => {
  const document = compactDesign(HOSTS);
  return { BODY: JSON.stringify({ baseVersion: 2, message: 'Every camera recorder of the campus', document }), DEVICES: document.devices.length };
})();

let t: TestApp | null = null;
let ravi: Agent;
let id: number;
let log: jest.SpyInstance;
beforeEach(() => {
  log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
});
afterEach(async () => {
  log.mockRestore();
  await t?.close();
  t = null;
});

async function start(env: Record<string, string>): Promise<TestApp> {
  const app = await makeTestApp({ env });
  t = app;
  ravi = await signInAs(app.app, 'designer');
  id = await designId(app);
  return app;
}

function saveInBackground() {
  let done = false;
  const response = ravi
    .post(`/api/designs/${id}/versions`)
    .type('json')
    .send(BODY)
    .then((res) => {
      done = true;
      return res;
    });
  return { response, isDone: () => done };
}

it('fits the body limit: the test is about a document the API takes', () => {
  // docs/api.md: documents up to 10 MB.
  expect(Buffer.byteLength(BODY)).toBeLessThan(BODY_LIMIT_BYTES);
});

it('saves a 20,000-host document while other requests are answered in under 50 ms, and serves its stored report', async () => {
  const t = await start({ ANALYSIS_TIMEOUT_MS: '150000' });
  const save = saveInBackground();
  const pool = analysisPool(t.config.analysis);
  expect(await until(() => pool.stats().running > 0 || save.isDone(), 30_000)).toBe(true);
  expect(save.isDone()).toBe(false);
  // Answered while the 20,000 hosts are validated and analysed (common practice: 50 ms is the bound).
  const list = await quickestGet(ravi, '/api/designs');
  const design = await quickestGet(ravi, `/api/designs/${id}`);
  const version = await quickestGet(ravi, `/api/designs/${id}/versions/2`);
  expect(save.isDone()).toBe(false);
  expect([list.status, design.status, version.status]).toEqual([200, 200, 200]);
  expect(Math.max(list.ms, design.ms, version.ms)).toBeLessThan(50);

  const res = await save.response;
  expect([res.status, res.body.error]).toEqual([201, undefined]);
  // Two cards per host, one on each fabric: every host redundant, no single point of failure.
  expect(res.body.version.summary).toMatchObject({ hosts: HOSTS, redundantHosts: HOSTS, singlePointsOfFailure: 0, errors: 0 });
  const n = res.body.version.number as number;

  // The stored report is served as stored; the analysis processes are not asked again.
  const spy = jest.spyOn(pool, 'run');
  try {
    const report = await ravi.get(`/api/designs/${id}/versions/${n}/report`).expect(200);
    expect(report.body.summary).toEqual(res.body.version.summary);
    expect(report.body.report.hosts).toHaveLength(HOSTS * 4); // every host with each of the four arrays
    const page = await ravi.get(`/api/designs/${id}/versions/${n}/report-page`).expect(200);
    expect(page.body.version.document.devices).toHaveLength(DEVICES);
    expect(spy).not.toHaveBeenCalled();
  } finally {
    spy.mockRestore();
  }
});

it('refuses the same document past a 40 MB heap with a sentence, and keeps answering', async () => {
  const t = await start({ ANALYSIS_MAX_OLD_MB: '40', ANALYSIS_TIMEOUT_MS: '150000' });
  const before = await t.models.DesignVersion.count();
  const res = await saveInBackground().response;
  // RFC 9110 §15.5.21: 422 Unprocessable Content.
  expect(res.status).toBe(422);
  expect(res.body.error).toMatch(/^The analysis of this document needed more than the 40 MB of memory the server allows, so it was not saved\./);
  expect(await t.models.DesignVersion.count()).toBe(before);
  const after = await quickestGet(ravi, `/api/designs/${id}`);
  expect(after.status).toBe(200);
});
