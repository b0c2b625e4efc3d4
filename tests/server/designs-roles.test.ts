import request from 'supertest';
import type { Response } from 'supertest';
import { signInAs, type Agent, type DemoWho, type TestApp, makeTestApp } from './helpers/app';
import { designId, harborV2, latestOf, saveAndSubmit, saveOnTop, signInQuaysideAdmin } from './helpers/designs';

/**
 * docs/api.md's role table for every design and version route, for each role, signed out, and an admin of
 * another team (who may do everything in their own team, so a refusal can only come from the team check).
 *
 * Status semantics (RFC 9110): 200 §15.3.1, 201 §15.3.2, 401 §15.5.2 (no credentials), 403 §15.5.4
 * (known but not allowed), 404 §15.5.5 — also for another team's design and for an installer asking
 * for a version that is not approved, so neither existence is revealed (docs/api.md).
 */
type Who = 'anonymous' | 'admin' | 'designer' | 'reviewer' | 'installer' | 'otherTeam';
const WHO: Who[] = ['anonymous', 'admin', 'designer', 'reviewer', 'installer', 'otherTeam'];

type Ctx = { id: number; ravi: Agent };
type Case = {
  route: string;
  /** Expected status for admin, designer, reviewer, installer, other team; signed out is always 401. */
  expect: [admin: number, designer: number, reviewer: number, installer: number, otherTeam: number];
  /** Makes the case's own target (as Ravi) and answers the path to call. */
  target?: (ctx: Ctx) => Promise<string>;
  call: (agent: ReturnType<typeof request> | Agent, path: string, ctx: Ctx) => Promise<Response>;
};

const get = (agent: ReturnType<typeof request> | Agent, path: string) => agent.get(path);
const comment = 'The fabric B cable of the new host is missing; please add it.';

/**
 * A document nobody else has saved: the admin saved harborV2 in an earlier case, and nobody reviews
 * content they saved themselves (four eyes), so the review cases give Ravi content of his own.
 */
let ravisEdits = 0;
function ravisOwnDocument() {
  const doc = harborV2();
  ravisEdits += 1;
  doc.cables[0].lengthM = 10 + ravisEdits;
  return doc;
}

const CASES: Case[] = [
  { route: 'GET /api/designs', expect: [200, 200, 200, 200, 200], target: async () => '/api/designs', call: get },
  {
    route: 'POST /api/designs',
    expect: [201, 201, 403, 403, 201],
    target: async () => '/api/designs',
    call: (a, path) => a.post(path).send({ name: 'Cold room 2 storage', document: harborV2() }),
  },
  { route: 'GET /api/designs/:id', expect: [200, 200, 200, 200, 404], target: async ({ id }) => `/api/designs/${id}`, call: get },
  {
    route: 'POST /api/designs/:id/versions',
    expect: [201, 201, 403, 403, 404],
    target: async ({ id }) => `/api/designs/${id}/versions`,
    call: async (a, path, { id, ravi }) => a.post(path).send({ baseVersion: await latestOf(ravi, id), message: 'Longer cables for the camera hosts', document: harborV2() }),
  },
  { route: 'GET /api/designs/:id/versions/:n (approved)', expect: [200, 200, 200, 200, 404], target: async ({ id }) => `/api/designs/${id}/versions/2`, call: get },
  { route: 'GET /api/designs/:id/versions/:n (changes asked)', expect: [200, 200, 200, 404, 404], target: async ({ id }) => `/api/designs/${id}/versions/1`, call: get },
  { route: 'GET /api/designs/:id/versions/:n/report (approved)', expect: [200, 200, 200, 200, 404], target: async ({ id }) => `/api/designs/${id}/versions/2/report`, call: get },
  { route: 'GET /api/designs/:id/versions/:n/report (changes asked)', expect: [200, 200, 200, 404, 404], target: async ({ id }) => `/api/designs/${id}/versions/1/report`, call: get },
  { route: 'GET …/diff between approved versions', expect: [200, 200, 200, 200, 404], target: async ({ id }) => `/api/designs/${id}/versions/2/diff?against=2`, call: get },
  { route: 'GET …/diff against a version in changes asked', expect: [200, 200, 200, 404, 404], target: async ({ id }) => `/api/designs/${id}/versions/2/diff?against=1`, call: get },
  {
    route: 'POST …/versions/:n/restore',
    expect: [201, 201, 403, 403, 404],
    target: async ({ id }) => `/api/designs/${id}/versions/1/restore`,
    call: (a, path) => a.post(path).send({ message: 'Back to the first layout to compare' }),
  },
  {
    route: 'POST …/versions/:n/review submit (a draft)',
    expect: [200, 200, 403, 403, 404],
    target: async ({ id, ravi }) => {
      const saved = await saveOnTop(ravi, id, harborV2());
      return `/api/designs/${id}/versions/${saved.body.version.number}/review`;
    },
    call: (a, path) => a.post(path).send({ action: 'submit' }),
  },
  {
    route: 'POST …/versions/:n/review approve (in review, by Ravi)',
    expect: [200, 403, 200, 403, 404],
    target: async ({ id, ravi }) => `/api/designs/${id}/versions/${await saveAndSubmit(ravi, id, ravisOwnDocument())}/review`,
    call: (a, path) => a.post(path).send({ action: 'approve' }),
  },
  {
    route: 'POST …/versions/:n/review request-changes (in review, by Ravi)',
    expect: [200, 403, 200, 403, 404],
    target: async ({ id, ravi }) => `/api/designs/${id}/versions/${await saveAndSubmit(ravi, id, ravisOwnDocument())}/review`,
    call: (a, path) => a.post(path).send({ action: 'request-changes', comment }),
  },
];

let t: TestApp;
let ctx: Ctx;
const agents = new Map<Who, Agent>();
beforeAll(async () => {
  t = await makeTestApp();
  for (const who of ['admin', 'designer', 'reviewer', 'installer'] as const satisfies readonly DemoWho[]) agents.set(who, await signInAs(t.app, who));
  agents.set('otherTeam', await signInQuaysideAdmin(t));
  ctx = { id: await designId(t), ravi: agents.get('designer') as Agent };
});
afterAll(() => t.close());

const rowCounts = async () =>
  Promise.all([t.models.Design.count(), t.models.DesignVersion.count(), t.models.ReviewEvent.count()]);

describe.each(CASES)('$route', (c) => {
  it.each(WHO)('answers the %s as the role table says, and writes nothing when it refuses', async (who) => {
    const expected = who === 'anonymous' ? 401 : c.expect[WHO.indexOf(who) - 1];
    const path = c.target ? await c.target(ctx) : '';
    const agent = who === 'anonymous' ? request(t.app) : (agents.get(who) as Agent);
    const before = await rowCounts();
    const res = await c.call(agent, path, ctx);
    expect({ who, status: res.status }).toEqual({ who, status: expected });
    if (expected >= 400) {
      expect(res.body.error).toEqual(expect.any(String));
      expect(await rowCounts()).toEqual(before);
    }
  });
});

describe('another team’s design answers exactly like a design that does not exist', () => {
  const paths = (id: number | string) => [
    ['get', `/api/designs/${id}`],
    ['get', `/api/designs/${id}/versions/2`],
    ['get', `/api/designs/${id}/versions/2/report`],
    ['get', `/api/designs/${id}/versions/2/diff?against=1`],
    ['post', `/api/designs/${id}/versions`, { baseVersion: 2, message: 'x', document: harborV2() }],
    ['post', `/api/designs/${id}/versions/1/restore`, { message: 'x' }],
    ['post', `/api/designs/${id}/versions/2/review`, { action: 'submit' }],
  ] as const;

  it('gives the other team’s admin the same 404 body for Harbor Road as for an id nobody has', async () => {
    const quinn = agents.get('otherTeam') as Agent;
    const real = paths(ctx.id);
    const missing = paths(999_999);
    for (let i = 0; i < real.length; i++) {
      const [method, path, body] = real[i];
      const [, missingPath] = missing[i];
      const a = await quinn[method](path).send(body);
      const b = await quinn[method](missingPath).send(body);
      // RFC 9110 §15.5.5: 404 Not Found, and docs/api.md: never reveal which.
      expect([path, a.status]).toEqual([path, 404]);
      expect(a.body).toEqual(b.body);
    }
  });

  it('lists only the caller’s own team’s designs', async () => {
    const sam = await signInAs(t.app, 'otherTeam');
    const theirs = (await sam.get('/api/designs').expect(200)).body.designs.map((d: { name: string }) => d.name);
    // Quinn, the Quayside admin of this file, made a design of Quayside's own above; Harbor Road is not there.
    expect(theirs).toContain('Quayside lab array');
    expect(theirs).not.toContain('Harbor Road storage');
    const ours = (await (agents.get('reviewer') as Agent).get('/api/designs').expect(200)).body.designs.map((d: { name: string }) => d.name);
    expect(ours).not.toContain('Quayside lab array');
    expect(ours).toContain('Harbor Road storage');
  });

  it('hides the other team’s design from its designer too, on every read', async () => {
    const sam = await signInAs(t.app, 'otherTeam');
    for (const [method, path] of paths(ctx.id).filter(([m]) => m === 'get')) {
      expect([path, (await sam[method](path)).status]).toEqual([path, 404]);
    }
  });
});
