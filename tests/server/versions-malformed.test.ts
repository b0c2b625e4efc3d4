import type { Server } from 'node:http';
import request from 'supertest';
import { DEMO, DEMO_PASSWORD, makeTestApp, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, type Issue } from './helpers/designs';
import { malformedDocuments, pointsInto } from './helpers/malformed';

let t: TestApp;
let server: Server;
let ravi: Agent;
let id: number;
beforeAll(async () => {
  t = await makeTestApp();
  // One listening server for the thousand requests (supertest otherwise starts one per request).
  server = t.app.listen(0);
  ravi = request.agent(server);
  await ravi.post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD }).expect(200);
  id = await designId(t);
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

const COUNT = 1000;

describe('generated malformed documents', () => {
  const cases = malformedDocuments(COUNT);

  it('covers every kind of mistake the schema must refuse, and random JSON', () => {
    const kinds = new Set(cases.flatMap((c) => c.kind.split(' + ')));
    expect([...kinds].sort()).toEqual(
      ['bad enum value', 'cable to itself', 'dangling reference', 'duplicate id', 'malformed address', 'missing field', 'random JSON', 'truncated array', 'unknown key', 'wrong kind of reference', 'wrong type'].sort(),
    );
    expect(cases).toHaveLength(COUNT);
  });

  it('answers every one with 400 and issues whose paths point into the body, never a 500, and stores none', async () => {
    const before = await t.models.DesignVersion.count();
    const statuses = new Map<number, number>();
    const misses: string[] = [];
    const check = async (i: number) => {
      const { kind, document, paths } = cases[i];
      // Every tenth goes to design creation, the other route that takes a document.
      const res =
        i % 10 === 0
          ? await ravi.post('/api/designs').send({ name: `Attempt ${i}`, document })
          : await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: `Attempt ${i}`, document });
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      const issues = (res.body.issues ?? []) as Issue[];
      if (
        res.status !== 400 ||
        issues.length === 0 ||
        !issues.every((x) => pointsInto(document, x.path)) ||
        JSON.stringify(issues.map((x) => x.path)) !== JSON.stringify(paths)
      ) {
        misses.push(`#${i} ${kind}: ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`);
      }
    };
    // A few at a time, as several browser tabs would send them.
    for (let i = 0; i < cases.length; i += 6) {
      await Promise.all(cases.slice(i, i + 6).map((_, j) => check(i + j)));
    }
    // RFC 9110 §15.5.1: 400 Bad Request for every one; §15.6.1 500 would be our fault.
    expect(misses.slice(0, 5)).toEqual([]);
    expect([...statuses.entries()]).toEqual([[400, COUNT]]);
    expect(await t.models.DesignVersion.count()).toBe(before);
  }, 60_000);

  it('keeps answering afterwards: reads work and a good document still saves', async () => {
    await ravi.get('/api/designs').expect(200);
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'After the junk', document: harborV2() });
    expect(res.status).toBe(201);
    expect(res.body.version.number).toBe(3);
  });
});
