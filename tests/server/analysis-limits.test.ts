import { analysisPool } from '@/server/services/analysis';
import { syntheticDesign } from '../bench/helpers/synthetic';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, latestOf } from './helpers/designs';
import { until } from './helpers/hostile';
import { quickestGet } from './helpers/timing';

/**
 * Saves whose analysis breaks the time or the memory limit of the analysis processes: 422 with a
 * sentence, nothing stored, and the server answers other requests meanwhile and afterwards.
 * A 5,000-host synthetic design takes well over a second to validate and analyse on this kind of
 * machine (`npm run bench`), so a 300 ms limit or a 40 MB heap cannot hold it.
 */
const BIG = syntheticDesign(5000);

jest.setTimeout(60_000);
let t: TestApp;
let ravi: Agent;
let id: number;
let log: jest.SpyInstance;
beforeEach(() => {
  // The server logs each limit it enforces; the tests check the answers instead.
  log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
});
afterEach(async () => {
  log.mockRestore();
  await t.close();
});

async function start(env: Record<string, string>) {
  t = await makeTestApp({ env });
  ravi = await signInAs(t.app, 'designer');
  id = await designId(t);
}

/** Save without awaiting, so the test can do other things while the server analyses. */
function saveInBackground(document: unknown) {
  let done = false;
  const response = ravi
    .post(`/api/designs/${id}/versions`)
    .send({ baseVersion: 2, message: 'Every camera recorder of the campus', document })
    .then((res) => {
      done = true;
      return res;
    });
  return { response, isDone: () => done };
}

function timedGet(path: string): Promise<{ status: number; ms: number }> {
  return quickestGet(ravi, path);
}

describe('a save past the time limit', () => {
  it('answers 422 with a sentence, stores nothing, and answers a GET in under 100 ms while it runs', async () => {
    await start({ ANALYSIS_TIMEOUT_MS: '300' });
    const before = await t.models.DesignVersion.count();
    const save = saveInBackground(BIG);
    const pool = analysisPool(t.config.analysis);
    expect(await until(() => pool.stats().running > 0 || save.isDone())).toBe(true);
    expect(save.isDone()).toBe(false);
    const during = await timedGet(`/api/designs/${id}`);
    expect(during.status).toBe(200);
    expect(during.ms).toBeLessThan(100);

    const res = await save.response;
    // RFC 9110 §15.5.21: 422 Unprocessable Content.
    expect(res.status).toBe(422);
    expect(res.body.error).toBe(
      'The analysis of this document took longer than the 0.3 seconds the server allows, so it was not saved. ' +
        'Simplify the document or split the design into smaller ones, and try again.',
    );
    expect(res.body.issues).toEqual([{ path: 'document', message: res.body.error }]);
    expect(await t.models.DesignVersion.count()).toBe(before);
  });

  it('replaces the process that hit the limit: the next save is analysed and stored', async () => {
    await start({ ANALYSIS_TIMEOUT_MS: '300' });
    expect((await saveInBackground(BIG).response).status).toBe(422);
    const next = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Back to the room', document: harborV2() });
    expect(next.status).toBe(201);
    expect(next.body.version.summary.hosts).toBe(6);
    expect(await latestOf(ravi, id)).toBe(3);
  });
});

describe('a save past the memory limit', () => {
  it('answers 422 naming the limit, and the server keeps answering', async () => {
    await start({ ANALYSIS_MAX_OLD_MB: '40', ANALYSIS_TIMEOUT_MS: '60000' });
    const res = await saveInBackground(BIG).response;
    expect(res.status).toBe(422);
    expect(res.body.error).toMatch(/^The analysis of this document needed more than the 40 MB of memory the server allows, so it was not saved\./);
    const after = await timedGet(`/api/designs/${id}`);
    expect(after.status).toBe(200);
    const small = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Small again', document: harborV2() });
    expect(small.status).toBe(201);
  });
});
