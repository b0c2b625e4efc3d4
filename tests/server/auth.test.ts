import request from 'supertest';
import { WRONG_CREDENTIALS } from '@/server/services/auth';
import { DEMO, DEMO_PASSWORD, makeTestApp, sessionCookie, sessionSetCookie, signInAs, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  t = await makeTestApp({ seed: 'people' });
});
afterEach(() => t.close());

describe('sign-in', () => {
  it.each(Object.entries(DEMO))('signs in the %s demo account and answers its user', async (_who, email) => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: expect.any(Number), email, name: expect.any(String), role: expect.any(String), teamId: expect.any(Number) });
    expect(res.body.user).not.toHaveProperty('passwordHash');
  });

  it('treats the e-mail case-blind and trims it', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: '  Maya@Tidewater.EXAMPLE ', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('admin');
  });

  it('answers a wrong password and an unknown e-mail with the same 401 and sentence', async () => {
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: 'not-the-password' });
    const unknown = await request(t.app).post('/api/auth/sign-in').send({ email: 'nobody@tidewater.example', password: 'not-the-password' });
    // RFC 9110 §15.5.2: 401 when credentials are missing or wrong.
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual({ error: WRONG_CREDENTIALS });
    expect(unknown.body).toEqual(wrong.body);
    expect(sessionCookie(wrong)).toBeUndefined();
  });

  it('sets the session cookie HttpOnly, SameSite=Lax, Path=/ and not Secure outside production', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD });
    const cookie = sessionSetCookie(res) ?? '';
    // RFC 6265 §4.1.2.6: HttpOnly keeps the cookie from scripts.
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    // RFC 6265bis (draft-ietf-httpbis-rfc6265bis) §4.1.2.7: SameSite=Lax withholds it from cross-site POSTs.
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
    expect(cookie).toMatch(/;\s*Path=\//);
    // RFC 6265 §4.1.2.5: Secure would stop the cookie over plain http://localhost in development.
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });

  it('gives every sign-in a new session id and refuses the previous one', async () => {
    const agent = request.agent(t.app);
    const first = await agent.post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD });
    const second = await agent.post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD });
    const oldCookie = sessionCookie(first) ?? '';
    expect(oldCookie).not.toBe('');
    expect(sessionCookie(second)).not.toBe(oldCookie);
    await request(t.app).get('/api/auth/me').set('Cookie', oldCookie).expect(401);
    await agent.get('/api/auth/me').expect(200);
  });
});

describe('sign-out and who am I', () => {
  it('answers 401 to /me without a session', async () => {
    const res = await request(t.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual(expect.any(String));
  });

  it('answers /me with the signed-in user', async () => {
    const agent = await signInAs(t.app, 'reviewer');
    const res = await agent.get('/api/auth/me').expect(200);
    expect(res.body.user).toMatchObject({ email: DEMO.reviewer, role: 'reviewer', name: 'Theo Brandt' });
  });

  it('ends the session at sign-out: 204, and the old cookie is refused afterwards', async () => {
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.installer, password: DEMO_PASSWORD });
    const cookie = sessionCookie(signIn) ?? '';
    await request(t.app).get('/api/auth/me').set('Cookie', cookie).expect(200);
    // RFC 9110 §15.3.5: 204 No Content.
    await request(t.app).post('/api/auth/sign-out').set('Cookie', cookie).expect(204);
    await request(t.app).get('/api/auth/me').set('Cookie', cookie).expect(401);
    expect(await t.models.Session.count()).toBe(0);
  });

  it('answers sign-out 204 also when nobody is signed in', async () => {
    await request(t.app).post('/api/auth/sign-out').expect(204);
  });

  it('signs a removed member out at once', async () => {
    const ravi = await signInAs(t.app, 'designer');
    const admin = await signInAs(t.app, 'admin');
    const me = await ravi.get('/api/auth/me').expect(200);
    await admin.delete(`/api/team/members/${me.body.user.id}`).expect(204);
    await ravi.get('/api/auth/me').expect(401);
  });

  it('applies a role change to an existing session at once', async () => {
    const theo = await signInAs(t.app, 'reviewer');
    const admin = await signInAs(t.app, 'admin');
    const me = await theo.get('/api/auth/me').expect(200);
    await admin.patch(`/api/team/members/${me.body.user.id}`).send({ role: 'installer' }).expect(200);
    expect((await theo.get('/api/auth/me').expect(200)).body.user.role).toBe('installer');
  });
});

describe('sign-in rate limit', () => {
  const wrong = () => request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: 'guess-guess-guess' });

  it('answers the 6th rapid wrong attempt with 429 and a JSON sentence', async () => {
    for (let i = 0; i < 5; i++) expect((await wrong()).status).toBe(401);
    const sixth = await wrong();
    // RFC 6585 §4: 429 Too Many Requests.
    expect(sixth.status).toBe(429);
    expect(sixth.body.error).toMatch(/Too many sign-in attempts/);
    // Blocked even with the right password until the window passes.
    await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD }).expect(429);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < 8; i++) {
      await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD }).expect(200);
    }
    for (let i = 0; i < 5; i++) expect((await wrong()).status).toBe(401);
    expect((await wrong()).status).toBe(429);
  });

  it('lets a whole team behind one address sign in at the same moment', async () => {
    const roles = ['admin', 'designer', 'reviewer', 'installer'] as const;
    const attempts = [...roles, ...roles].map((role) =>
      request(t.app).post('/api/auth/sign-in').send({ email: DEMO[role], password: DEMO_PASSWORD }),
    );
    const statuses = (await Promise.all(attempts)).map((res) => res.status);
    expect(statuses).toEqual(Array(8).fill(200));
  });

  it('counts wrong passwords per account, so one locked account does not lock out the others', async () => {
    for (let i = 0; i < 6; i++) await wrong();
    expect((await wrong()).status).toBe(429);
    await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD }).expect(200);
  });

  it('stops one address guessing across many accounts after 30 failures', async () => {
    const guess = (i: number) =>
      request(t.app).post('/api/auth/sign-in').send({ email: `nobody-${i}@tidewater.example`, password: 'guess-guess-guess' });
    for (let i = 0; i < 30; i++) expect((await guess(i)).status).toBe(401);
    expect((await guess(30)).status).toBe(429);
  });
});

describe('under production settings', () => {
  let prod: TestApp;
  beforeEach(async () => {
    prod = await makeTestApp({ env: { NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(40), BCRYPT_COST: '10', SEED: 'none' } });
  });
  afterEach(() => prod.close());

  it('marks the session cookie Secure behind the TLS proxy', async () => {
    const res = await request(prod.app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .send({ email: DEMO.admin, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = sessionSetCookie(res) ?? '';
    // RFC 6265 §4.1.2.5: Secure limits the cookie to secure channels.
    expect(cookie).toMatch(/;\s*Secure/i);
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
  });
});
