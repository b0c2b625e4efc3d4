import request from 'supertest';
import { WRONG_CREDENTIALS } from '@/server/services/auth';
import { DEMO, DEMO_PASSWORD, makeTestApp, PRODUCTION_ENV, sessionCookie, sessionSetCookie, signInAs, type TestApp } from './helpers/app';

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

describe('session expiry', () => {
  it('moves the stored expiry of a session at most once in ten minutes, not on every request', async () => {
    const agent = await signInAs(t.app, 'designer');
    const writes: string[] = [];
    const options = (t.sequelize as unknown as { options: { logging: unknown } }).options;
    options.logging = (sql: string) => {
      if (/^Executing \(default\): UPDATE `sessions`/.test(sql)) writes.push(sql);
    };
    try {
      for (let i = 0; i < 5; i++) await agent.get('/api/auth/me').expect(200);
    } finally {
      options.logging = false;
    }
    expect(writes.length).toBeLessThanOrEqual(1);
    const stored = await t.models.Session.findOne({ where: { userId: (await agent.get('/api/auth/me')).body.user.id } });
    // The session still lasts its 14 days from about now.
    expect(stored!.expires!.getTime()).toBeGreaterThan(Date.now() + 13.9 * 24 * 60 * 60 * 1000);
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

describe('sign-in limits: a short wait that grows, never a long lockout', () => {
  let now = Date.now();
  let limited: TestApp;
  beforeEach(async () => {
    now = Date.now();
    limited = await makeTestApp({ seed: 'people', clock: () => now });
  });
  afterEach(() => limited.close());

  /** A sign-in from `address` (the test client is on loopback, whose X-Forwarded-For the app believes outside production). */
  const attempt = (email: string, password: string, address = '198.51.100.7') =>
    request(limited.app).post('/api/auth/sign-in').set('X-Forwarded-For', address).send({ email, password });
  const wrong = (email: string = DEMO.admin, address?: string) => attempt(email, 'guess-guess-guess', address);
  const right = (email: string = DEMO.admin, address?: string) => attempt(email, DEMO_PASSWORD, address);

  it('lets five wrong passwords through, then asks for a one-second wait with 429, Retry-After and a sentence', async () => {
    for (let i = 0; i < 5; i++) expect((await wrong()).status).toBe(401);
    const sixth = await wrong();
    // RFC 6585 §4: 429 Too Many Requests; RFC 9110 §10.2.3: Retry-After in seconds.
    expect(sixth.status).toBe(429);
    expect(sixth.headers['retry-after']).toBe('1');
    expect(sixth.body.error).toBe('Too many sign-in attempts. Wait 1 second and try again.');
  });

  it('lets the right password in after the short wait, even after many failures', async () => {
    // Ten wrong passwords, each one waited for when asked to wait.
    for (let failures = 0; failures < 10; ) {
      const res = await wrong();
      if (res.status === 429) now += Number(res.headers['retry-after']) * 1000;
      else failures += 1;
    }
    const blocked = await right();
    expect(blocked.status).toBe(429);
    const waitSeconds = Number(blocked.headers['retry-after']);
    // Never a long wall: the longest wait per address and account is half a minute.
    expect(waitSeconds).toBeLessThanOrEqual(30);
    now += waitSeconds * 1000;
    await right().expect(200);
    // And a success clears the count: the next mistake is a plain 401 again.
    expect((await wrong()).status).toBe(401);
  });

  it('doubles the wait with each further failure, up to 30 seconds', async () => {
    const waits: number[] = [];
    for (let i = 0; i < 5; i++) await wrong();
    for (let i = 0; i < 7; i++) {
      const res = await wrong();
      const seconds = Number(res.headers['retry-after']);
      waits.push(seconds);
      now += seconds * 1000;
      expect((await wrong()).status).toBe(401);
    }
    expect(waits).toEqual([1, 2, 4, 8, 16, 30, 30]);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < 8; i++) await right().expect(200);
    for (let i = 0; i < 5; i++) expect((await wrong()).status).toBe(401);
    expect((await wrong()).status).toBe(429);
  });

  it('lets a whole team behind one address sign in at the same moment', async () => {
    const roles = ['admin', 'designer', 'reviewer', 'installer'] as const;
    const statuses = (await Promise.all([...roles, ...roles].map((role) => right(DEMO[role])))).map((res) => res.status);
    expect(statuses).toEqual(Array(8).fill(200));
  });

  it('slows one account, not its neighbours behind the same address', async () => {
    for (let i = 0; i < 6; i++) await wrong();
    expect((await wrong()).status).toBe(429);
    await right(DEMO.designer).expect(200);
  });

  it('counts wrong passwords on one account across addresses too, and still lets the right one in after a wait', async () => {
    // 20 addresses from RFC 5737's documentation ranges, one failure each: no single address is slowed.
    for (let i = 1; i <= 20; i++) expect((await wrong(DEMO.admin, `203.0.113.${i}`)).status).toBe(401);
    const fresh = await wrong(DEMO.admin, '203.0.113.99');
    expect(fresh.status).toBe(429);
    const fromHome = await right(DEMO.admin, '192.0.2.44');
    expect(fromHome.status).toBe(429);
    const seconds = Number(fromHome.headers['retry-after']);
    expect(seconds).toBeLessThanOrEqual(60);
    now += seconds * 1000;
    await right(DEMO.admin, '192.0.2.44').expect(200);
    // Other accounts were never slowed.
    await right(DEMO.designer, '203.0.113.99').expect(200);
  });

  it('slows one address trying many accounts after ten of them', async () => {
    const guess = (i: number) => wrong(`nobody-${i}@tidewater.example`);
    for (let i = 0; i < 10; i++) expect((await guess(i)).status).toBe(401);
    expect((await guess(10)).status).toBe(429);
    expect((await guess(11)).status).toBe(429);
  });

  it('treats a password longer than 72 bytes as any wrong password: 401, never 400', async () => {
    // bcrypt reads only the first 72 bytes (Provos & Mazières 1999), so a longer one can match nothing stored.
    const res = await attempt(DEMO.admin, DEMO_PASSWORD + 'x'.repeat(80));
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: WRONG_CREDENTIALS });
  });
});

describe('under production settings', () => {
  let prod: TestApp;
  const signIn = () => request(prod.app).post('/api/auth/sign-in');
  afterEach(() => prod.close());

  it('marks the session cookie Secure behind a TLS proxy that TRUST_PROXY names', async () => {
    prod = await makeTestApp({ env: { ...PRODUCTION_ENV, TRUST_PROXY: 'loopback' } });
    const res = await signIn().set('X-Forwarded-Proto', 'https').send({ email: DEMO.admin, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = sessionSetCookie(res) ?? '';
    // RFC 6265 §4.1.2.5: Secure limits the cookie to secure channels.
    expect(cookie).toMatch(/;\s*Secure/i);
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
  });

  it('refuses a sign-in over plain HTTP with a sentence instead of answering 200 without a cookie', async () => {
    prod = await makeTestApp({ env: PRODUCTION_ENV });
    // X-Forwarded-Proto from a proxy TRUST_PROXY does not name is not believed.
    const res = await signIn().set('X-Forwarded-Proto', 'https').send({ email: DEMO.admin, password: DEMO_PASSWORD });
    // RFC 9110 §15.5.4: 403 Forbidden.
    expect(res.status).toBe(403);
    expect(res.body.error).toBe('Signing in needs HTTPS, and this request came over plain HTTP, so no session could be kept. Open https://cablewright.example instead.');
    expect(sessionCookie(res)).toBeUndefined();
  });

  it('believes neither X-Forwarded-Proto nor X-Forwarded-For from a connection that is not a named proxy', async () => {
    // The connection comes from loopback; the named proxy is 192.0.2.1 (RFC 5737).
    prod = await makeTestApp({ env: { ...PRODUCTION_ENV, TRUST_PROXY: '192.0.2.1' } });
    for (let i = 1; i <= 3; i++) {
      const res = await signIn().set('X-Forwarded-Proto', 'https').set('X-Forwarded-For', `198.51.100.${i}`).send({ email: DEMO.admin, password: DEMO_PASSWORD });
      expect(res.status).toBe(403);
    }
  });
});

describe('forwarded addresses and the sign-in limits', () => {
  it('counts a client that rotates X-Forwarded-For by its connection when no proxy is trusted', async () => {
    const t2 = await makeTestApp({ seed: 'people', env: { TRUST_PROXY: 'none' } });
    try {
      const statuses: number[] = [];
      for (let i = 1; i <= 6; i++) {
        const res = await request(t2.app).post('/api/auth/sign-in').set('X-Forwarded-For', `198.51.100.${i}`).send({ email: DEMO.admin, password: 'guess-guess-guess' });
        statuses.push(res.status);
      }
      expect(statuses).toEqual([401, 401, 401, 401, 401, 429]);
    } finally {
      await t2.close();
    }
  });
});
