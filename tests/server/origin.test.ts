import request from 'supertest';
import { CROSS_SITE } from '@/server/middleware/origin';
import { APP_ORIGIN, DEMO, DEMO_PASSWORD, makeTestApp, PRODUCTION_ENV, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  t = await makeTestApp({ seed: 'people' });
});
afterEach(() => t.close());

const signIn = () => request(t.app).post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD });

describe('cross-site requests', () => {
  it('refuses a state-changing request with a foreign Origin: 403 with a sentence', async () => {
    // RFC 6454 §7: browsers name the requesting page's origin in Origin; RFC 9110 §15.5.4: 403 Forbidden.
    const res = await signIn().set('Origin', 'https://elsewhere.example');
    expect(res.status).toBe(403);
    expect(res.body).toEqual({ error: CROSS_SITE });
  });

  it('refuses an opaque origin ("null", from sandboxed frames and some redirects)', async () => {
    await signIn().set('Origin', 'null').expect(403);
  });

  it('refuses Sec-Fetch-Site: cross-site even without Origin', async () => {
    // W3C Fetch Metadata Request Headers §2.4: cross-site requests say so.
    await signIn().set('Sec-Fetch-Site', 'cross-site').expect(403);
  });

  it('refuses a foreign Origin on DELETE and PATCH too', async () => {
    const agent = request.agent(t.app);
    await agent.post('/api/auth/sign-in').send({ email: DEMO.admin, password: DEMO_PASSWORD }).expect(200);
    await agent.patch('/api/team/members/2').set('Origin', 'https://elsewhere.example').send({ role: 'reviewer' }).expect(403);
    await agent.delete('/api/team/members/2').set('Origin', 'https://elsewhere.example').expect(403);
  });

  it('accepts the app’s own origin (APP_URL) and no Origin at all', async () => {
    await signIn().set('Origin', APP_ORIGIN).set('Sec-Fetch-Site', 'same-origin').expect(200);
    await signIn().expect(200);
  });

  it('compares Origin with APP_URL, never with the Host header: a forged Host with a matching Origin is refused', async () => {
    const res = await signIn().set('Host', 'elsewhere.example').set('Origin', 'http://elsewhere.example');
    // RFC 9110 §7.2: Host is chosen by the client; RFC 9110 §15.5.4: 403 Forbidden.
    expect(res.status).toBe(403);
    expect(res.body).toEqual({ error: CROSS_SITE });
    // The server's own address under another name is not APP_URL either.
    const server = t.app.listen(0);
    try {
      const port = (server.address() as { port: number }).port;
      await request(server).post('/api/auth/sign-in').set('Origin', `http://127.0.0.1:${port}`)
        .send({ email: DEMO.admin, password: DEMO_PASSWORD }).expect(403);
    } finally {
      server.close();
    }
  });

  it('accepts an origin listed in TRUSTED_ORIGINS', async () => {
    const extra = await makeTestApp({ seed: 'people', env: { TRUSTED_ORIGINS: 'https://desk.tidewater.example' } });
    try {
      await request(extra.app).post('/api/auth/sign-in').set('Origin', 'https://desk.tidewater.example')
        .send({ email: DEMO.admin, password: DEMO_PASSWORD }).expect(200);
    } finally {
      await extra.close();
    }
  });

  it('accepts the Expo dev server origin outside production', async () => {
    await signIn().set('Origin', 'http://localhost:8081').set('Sec-Fetch-Site', 'same-site').expect(200);
  });

  it('lets reads through whatever the Origin', async () => {
    await request(t.app).get('/api/auth/me').set('Origin', 'https://elsewhere.example').expect(401);
  });
});

describe('cross-site requests under production settings', () => {
  it('refuses the Expo dev server origin in production', async () => {
    const prod = await makeTestApp({ env: PRODUCTION_ENV, seed: false });
    try {
      const res = await request(prod.app).post('/api/auth/sign-in').set('Origin', 'http://localhost:8081')
        .send({ email: DEMO.admin, password: DEMO_PASSWORD });
      expect(res.status).toBe(403);
      expect(res.body).toEqual({ error: CROSS_SITE });
    } finally {
      await prod.close();
    }
  });
});
