import request from 'supertest';
import { makeTestApp, signInAs, type Agent, type DemoWho, type TestApp } from './helpers/app';
import { buildPath, JPEG_8X8, newClientId } from './helpers/build';
import { designId, signInQuaysideAdmin } from './helpers/designs';

/**
 * The role table of every site-work route (docs/api.md): anonymous 401; a role that may not do it 403;
 * another team 404; an installer asking for a version that is not approved 404 (as for reading it);
 * an admin marking a version that is not approved 409 (a request in the wrong review state).
 * The demo: Harbor Road v1 was sent back (changes asked), v2 is approved; Sam and Quinn are Quayside's.
 */
let t: TestApp;
let id: number;
const agents = new Map<DemoWho | 'otherAdmin', Agent>();
beforeAll(async () => {
  t = await makeTestApp();
  id = await designId(t);
  for (const who of ['admin', 'designer', 'reviewer', 'installer', 'otherTeam'] as const) agents.set(who, await signInAs(t.app, who));
  agents.set('otherAdmin', await signInQuaysideAdmin(t));
});
afterAll(() => t.close());

const as = (who: DemoWho | 'otherAdmin') => agents.get(who)!;
const CABLE = 'cable-a-01';
const STEP = '["safety","briefing"]';

type Call = (agent: Agent | ReturnType<typeof request>, n: number) => request.Test;
const WRITES: Record<string, Call> = {
  'POST build/marks': (a, n) => a.post(buildPath(id, n, '/marks')).send({ cableId: CABLE, state: 'run', clientId: newClientId() }),
  'POST build/steps': (a, n) => a.post(buildPath(id, n, '/steps')).send({ stepId: STEP, done: true, clientId: newClientId() }),
  'POST build/photos': (a, n) => a.post(buildPath(id, n, '/photos')).field('cableId', CABLE).attach('photo', JPEG_8X8, 'cable.jpg'),
};
const READS: Record<string, Call> = {
  'GET build': (a, n) => a.get(buildPath(id, n)),
  'GET build/history': (a, n) => a.get(buildPath(id, n, '/history')),
  'GET build/checklist': (a, n) => a.get(buildPath(id, n, '/checklist')),
};

describe.each(Object.entries(WRITES))('%s', (_name, call) => {
  it('is 401 signed out, 403 for designers and reviewers, 404 for another team', async () => {
    const anonymous = await call(request(t.app), 2);
    expect(anonymous.status).toBe(401); // RFC 9110 §15.5.2
    for (const who of ['designer', 'reviewer', 'otherTeam'] as const) {
      const res = await call(as(who), 2);
      expect([who, res.status]).toEqual([who, 403]); // RFC 9110 §15.5.4
      expect(res.body.error).toMatch(/does not allow this/);
    }
    const other = await call(as('otherAdmin'), 2);
    expect(other.status).toBe(404);
    expect(other.body).toEqual({ error: 'There is no such design in your team.' });
  });

  it('takes installers and admins on the approved version; a version not approved is 404 to installers and 409 to admins', async () => {
    for (const who of ['installer', 'admin'] as const) expect([who, (await call(as(who), 2)).status]).toEqual([who, 201]);
    const draft = await call(as('installer'), 1);
    expect(draft.status).toBe(404);
    expect(draft.body).toEqual({ error: 'This design has no version 1.' });
    const admin = await call(as('admin'), 1);
    expect(admin.status).toBe(409); // RFC 9110 §15.5.10
    expect(admin.body.error).toBe('Version 1 is sent back with changes asked; only an approved version is built, so only its record takes marks and photos.');
    expect((await call(as('admin'), 99)).status).toBe(404);
  });
});

describe.each(Object.entries(READS))('%s', (_name, call) => {
  it('is read by the whole team, installers on approved versions only; 401 signed out, 404 for another team', async () => {
    expect((await call(request(t.app), 2)).status).toBe(401);
    for (const who of ['admin', 'designer', 'reviewer', 'installer'] as const) expect([who, (await call(as(who), 2)).status]).toEqual([who, 200]);
    for (const who of ['admin', 'designer', 'reviewer'] as const) expect([who, (await call(as(who), 1)).status]).toEqual([who, 200]);
    const draft = await call(as('installer'), 1);
    expect(draft.status).toBe(404);
    expect(draft.body).toEqual({ error: 'This design has no version 1.' });
    for (const who of ['otherTeam', 'otherAdmin'] as const) expect([who, (await call(as(who), 2)).status]).toEqual([who, 404]);
    const bad = await as('designer').get(`/api/designs/${id}/versions/two/build`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path)).toEqual(['params.n']);
  });
});

describe('GET /api/photos/:id', () => {
  it('is 401 signed out, served to the whole team, and 404 to another team and for an unknown id', async () => {
    const uploaded = await as('installer').post(buildPath(id, 2, '/photos')).field('cableId', CABLE).attach('photo', JPEG_8X8, 'cable.jpg').expect(201);
    const path = `/api/photos/${uploaded.body.photo.id}`;
    expect((await request(t.app).get(path)).status).toBe(401);
    for (const who of ['admin', 'designer', 'reviewer', 'installer'] as const) expect([who, (await as(who).get(path)).status]).toEqual([who, 200]);
    for (const who of ['otherTeam', 'otherAdmin'] as const) {
      const res = await as(who).get(path);
      expect([who, res.status]).toEqual([who, 404]);
      expect(res.body).toEqual({ error: 'There is no such photo in your team.' });
    }
    expect((await as('admin').get(`/api/photos/${newClientId()}`)).status).toBe(404);
    expect((await as('admin').get('/api/photos/not-a-uuid')).status).toBe(400);
  });
});
