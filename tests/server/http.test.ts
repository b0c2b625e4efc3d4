import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { makeTestApp, PRODUCTION_ENV, signInAs, type TestApp } from './helpers/app';

describe('the API surface', () => {
  let t: TestApp;
  beforeEach(async () => {
    t = await makeTestApp();
  });
  afterEach(() => t.close());

  it('answers unknown /api paths with 404 JSON, for any method', async () => {
    for (const method of ['get', 'post', 'delete'] as const) {
      const res = await request(t.app)[method]('/api/no-such-thing');
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/application\/json/);
      expect(res.body.error).toMatch(/no API route/);
    }
  });

  it('sends a Content-Security-Policy that allows only our own scripts, and inline styles for react-native-web', async () => {
    const res = await request(t.app).get('/api/auth/me');
    const csp = Object.fromEntries(
      String(res.headers['content-security-policy'])
        .split(';')
        .map((d) => d.trim().split(/\s+/))
        .map(([name, ...values]) => [name, values]),
    );
    expect(csp['script-src']).toEqual(["'self'"]);
    expect(csp['style-src']).toEqual(["'self'", "'unsafe-inline'"]);
    expect(csp['img-src']).toEqual(expect.arrayContaining(["'self'", 'data:', 'blob:']));
    expect(csp['font-src']).toEqual(expect.arrayContaining(["'self'", 'data:']));
    expect(csp['object-src']).toEqual(["'none'"]);
    expect(csp['frame-ancestors']).toEqual(["'none'"]);
    // Outside production the app runs over http://localhost: no upgrade and no HSTS.
    expect(csp).not.toHaveProperty('upgrade-insecure-requests');
    expect(res.headers).not.toHaveProperty('strict-transport-security');
    expect(res.headers).not.toHaveProperty('x-powered-by');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });

  it('marks API answers not cacheable', async () => {
    const admin = await signInAs(t.app, 'admin');
    const res = await admin.get('/api/team').expect(200);
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('answers an unexpected server failure with a generic 500 that leaks no stack or internal message', async () => {
    const admin = await signInAs(t.app, 'admin');
    const spy = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      await t.sequelize.getQueryInterface().dropTable('invitations');
      const res = await admin.get('/api/team');
      expect(res.status).toBe(500);
      expect(Object.keys(res.body)).toEqual(['error']);
      expect(res.body.error).toMatch(/went wrong on our side/);
      expect(res.text).not.toMatch(/SQLITE|no such table|at .*\.ts:\d+/);
      expect(spy).toHaveBeenCalled();
    } finally {
      spy.mockRestore();
    }
  });
});

describe('under production settings', () => {
  it('sends HSTS and upgrade-insecure-requests', async () => {
    const prod = await makeTestApp({ env: PRODUCTION_ENV, seed: false });
    try {
      const res = await request(prod.app).get('/api/auth/me');
      // RFC 6797 §6.1: Strict-Transport-Security with max-age.
      expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(res.headers['content-security-policy']).toMatch(/upgrade-insecure-requests/);
    } finally {
      await prod.close();
    }
  });
});

describe('serving the exported web app', () => {
  let dir: string;
  let t: TestApp;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'cw-web-'));
    mkdirSync(path.join(dir, '_expo/static/js/web'), { recursive: true });
    writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>Cablewright test shell</title>');
    writeFileSync(path.join(dir, '_expo/static/js/web/entry-abc123.js'), 'console.log("bundle")');
    writeFileSync(path.join(dir, '.source-hash'), 'secret-ish\n');
    t = await makeTestApp({ env: { WEB_DIR: dir }, seed: false });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('answers client routes with index.html (SPA fallback), not cached', async () => {
    for (const route of ['/', '/designs', '/invitations/abc', '/team/members/3']) {
      const res = await request(t.app).get(route);
      expect(res.status).toBe(200);
      expect(res.text).toContain('Cablewright test shell');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('serves hashed bundles with a long cache life', async () => {
    const res = await request(t.app).get('/_expo/static/js/web/entry-abc123.js');
    expect(res.status).toBe(200);
    expect(res.text).toContain('bundle');
    expect(res.headers['cache-control']).toMatch(/max-age=31536000/);
  });

  it('answers a missing file with 404 instead of the app, and hides dotfiles', async () => {
    await request(t.app).get('/_expo/static/js/web/entry-old.js').expect(404);
    await request(t.app).get('/.source-hash').expect(404);
  });

  it('keeps unknown /api paths a JSON 404 even with the web app present', async () => {
    const res = await request(t.app).get('/api/designs-not-yet');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
  });

  it('says the web app is not built when there is no export', async () => {
    const bare = await makeTestApp({ seed: false });
    try {
      const res = await request(bare.app).get('/designs');
      expect(res.status).toBe(404);
      expect(res.text).toMatch(/npm run build:web/);
    } finally {
      await bare.close();
    }
  });

  it('serves the build once it appears, without a restart', async () => {
    const later = mkdtempSync(path.join(tmpdir(), 'cw-web-later-'));
    const early = await makeTestApp({ env: { WEB_DIR: later }, seed: false });
    try {
      await request(early.app).get('/designs').expect(404);
      writeFileSync(path.join(later, 'index.html'), '<!doctype html><title>Built later</title>');
      const res = await request(early.app).get('/designs').expect(200);
      expect(res.text).toContain('Built later');
    } finally {
      await early.close();
      rmSync(later, { recursive: true, force: true });
    }
  });
});

describe('development through the Expo dev server (npm run dev)', () => {
  it('passes pages to the dev server and keeps /api on this app', async () => {
    const metro = createServer((req, res) => {
      res.setHeader('content-type', 'text/html');
      res.end(`<!doctype html><title>dev page for ${req.url}</title>`);
    });
    await new Promise<void>((resolve) => metro.listen(0, '127.0.0.1', resolve));
    const { port } = metro.address() as { port: number };
    const t = await makeTestApp({ env: { WEB_DEV_SERVER: `http://127.0.0.1:${port}` }, seed: false });
    try {
      const page = await request(t.app).get('/designs/3').expect(200);
      expect(page.text).toContain('dev page for /designs/3');
      const api = await request(t.app).get('/api/auth/me');
      expect(api.status).toBe(401);
      expect(api.headers['content-type']).toMatch(/application\/json/);
    } finally {
      await t.close();
      await new Promise((resolve) => metro.close(resolve));
    }
  });
});
