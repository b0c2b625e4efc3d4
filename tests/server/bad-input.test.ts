import fc from 'fast-check';
import request from 'supertest';
import { DEMO, DEMO_PASSWORD, makeTestApp, signInAs, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  // A fresh app per test: the sign-in rate limit counts the junk and the bad bodies too.
  t = await makeTestApp({ seed: 'people' });
});
afterEach(() => t.close());

type Issue = { path: string; message: string };
const paths = (res: request.Response) => (res.body.issues as Issue[]).map((i) => i.path).sort();

describe('bodies that fail validation answer 400 with field paths', () => {
  it('names every missing field of a sign-in', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({});
    // RFC 9110 §15.5.1: 400 Bad Request.
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['email', 'password']);
    expect(res.body.error).toEqual(expect.any(String));
  });

  it('names fields of the wrong type', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: 42, password: ['x'] });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['email', 'password']);
  });

  it('refuses unknown fields (the shared schemas are strict)', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD, role: 'admin' });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].message).toMatch(/role/);
  });

  it('answers a body that is not an object, or no body at all', async () => {
    const array = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('[1,2]');
    expect(array.status).toBe(400);
    expect(array.body.issues).toEqual([{ path: '', message: expect.any(String) }]);
    // The JSON parser takes only objects and arrays at the top (body-parser's strict mode).
    for (const body of ['"text"', 'null', '7']) {
      const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(body);
      expect(res.status).toBe(400);
      expect(res.body.error).toEqual(expect.any(String));
    }
    const none = await request(t.app).post('/api/auth/sign-in');
    expect(none.status).toBe(400);
    expect(none.body.issues).toEqual([{ path: '', message: expect.any(String) }]);
  });

  it('names the invitation fields: a bad e-mail and an unknown role', async () => {
    const admin = await signInAs(t.app, 'admin');
    const res = await admin.post('/api/team/invitations').send({ email: 'not an address', role: 'owner' });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['email', 'role']);
  });

  it('names a bad member id as params.id', async () => {
    const admin = await signInAs(t.app, 'admin');
    for (const id of ['abc', '-1', '0', '1.5']) {
      const res = await admin.patch(`/api/team/members/${id}`).send({ role: 'designer' });
      expect(res.status).toBe(400);
      expect(paths(res)).toEqual(['params.id']);
    }
  });
});

describe('bodies the server cannot read', () => {
  it('answers invalid JSON with 400 and a sentence', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": "maya@');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: 'The request body is not valid JSON.' });
  });

  it('answers an 11 MB body with 413 and a sentence', async () => {
    const admin = await signInAs(t.app, 'admin');
    const big = JSON.stringify({ email: 'a@tidewater.example', role: 'designer', padding: 'x'.repeat(11 * 1024 * 1024) });
    const res = await admin.post('/api/team/invitations').set('Content-Type', 'application/json').send(big);
    // RFC 9110 §15.5.14: 413 Content Too Large; docs/api.md: documents up to 10 MB.
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ error: 'The request body is larger than 10 MB.' });
  });

  it('accepts a body just under 10 MB as far as the parser (then validation answers)', async () => {
    const admin = await signInAs(t.app, 'admin');
    const body = JSON.stringify({ email: 'a@tidewater.example', role: 'designer', padding: 'x'.repeat(9 * 1024 * 1024) });
    const res = await admin.post('/api/team/invitations').set('Content-Type', 'application/json').send(body);
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['']);
  });
});

describe('generated junk never gets a 500', () => {
  const routes: Array<[method: 'post' | 'patch' | 'delete' | 'get', path: string]> = [
    ['post', '/api/auth/sign-in'],
    ['post', '/api/auth/sign-out'],
    ['get', '/api/auth/me'],
    ['get', '/api/team'],
    ['post', '/api/team/invitations'],
    ['delete', '/api/team/invitations/1'],
    ['patch', '/api/team/members/2'],
    ['delete', '/api/team/members/999'],
    ['get', `/api/invitations/${'B'.repeat(43)}`],
    ['post', `/api/invitations/${'B'.repeat(43)}/accept`],
    ['get', '/api/dev/mail'],
  ];
  const junk = fc.oneof(
    fc.jsonValue(),
    fc.record({ email: fc.jsonValue(), password: fc.jsonValue(), role: fc.jsonValue(), name: fc.jsonValue() }, { requiredKeys: [] }),
  );

  it.each(routes)('%s %s answers JSON below 500 for any JSON body, signed in as admin', async (method, path) => {
    const admin = await signInAs(t.app, 'admin');
    await fc.assert(
      fc.asyncProperty(junk, async (body) => {
        const res = await admin[method](path).set('Content-Type', 'application/json').send(JSON.stringify(body));
        expect(res.status).toBeLessThan(500);
        if (res.status >= 400) expect(res.body.error).toEqual(expect.any(String));
      }),
      { numRuns: 25 },
    );
  });

  it('answers garbage bytes of any content type below 500', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string(), fc.constantFrom('application/json', 'text/plain', 'application/x-www-form-urlencoded'), async (text, type) => {
        const res = await request(t.app).post('/api/team/invitations').set('Content-Type', type).send(text);
        expect(res.status).toBeLessThan(500);
      }),
      { numRuns: 40 },
    );
  });
});
