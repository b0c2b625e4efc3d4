import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { get } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliDecompressSync } from 'node:zlib';
import request from 'supertest';
import { DEMO, DEMO_PASSWORD, makeTestApp, sessionCookie, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveOnTop, signInQuaysideAdmin } from './helpers/designs';

/**
 * Compression, caching and revalidation. Compression: RFC 9110 §8.4 (Content-Encoding), gzip per
 * RFC 1952, brotli per RFC 7932. Caching: RFC 9111 §5.2.2 (no-cache, private), RFC 8246
 * (immutable). Revalidation: RFC 9110 §8.8.3 (ETag), §13.1.2 (If-None-Match), §15.4.5 (304).
 */
jest.setTimeout(30_000);

/** The raw bytes of an answer as they come over the wire (no client decoding), with the encoding asked for. */
async function rawGet(app: TestApp['app'], url: string, encoding: string, cookie?: string): Promise<{ headers: Record<string, unknown>; body: Buffer }> {
  const server = app.listen(0);
  try {
    await new Promise<void>((resolve) => server.once('listening', resolve));
    const { port } = server.address() as { port: number };
    return await new Promise((resolve, reject) => {
      const headers: Record<string, string> = { 'Accept-Encoding': encoding, ...(cookie ? { Cookie: cookie } : {}) };
      get({ host: '127.0.0.1', port, path: url, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
      }).on('error', reject);
    });
  } finally {
    server.close();
  }
}

describe('the API', () => {
  let t: TestApp;
  let ravi: Agent;
  let id: number;
  beforeAll(async () => {
    t = await makeTestApp();
    ravi = await signInAs(t.app, 'designer');
    id = await designId(t);
  });
  afterAll(() => t.close());

  it('compresses JSON answers with gzip, and with brotli when the client prefers it', async () => {
    const plain = await ravi.get(`/api/designs/${id}/versions/2`).set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    const gzip = await ravi.get(`/api/designs/${id}/versions/2`).set('Accept-Encoding', 'gzip').expect(200);
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(gzip.body).toEqual(plain.body);
    // Vary: Accept-Encoding, so a cache never hands a gzip answer to a client that did not ask (RFC 9110 §12.5.5).
    expect(gzip.headers.vary).toMatch(/Accept-Encoding/i);

    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD }).expect(200);
    const br = await rawGet(t.app, `/api/designs/${id}/versions/2`, 'br', sessionCookie(signIn));
    expect(br.headers['content-encoding']).toBe('br');
    const decoded = brotliDecompressSync(br.body).toString('utf8');
    expect(JSON.parse(decoded)).toEqual(plain.body);
    expect(br.body.length).toBeLessThan(decoded.length / 3);
  });

  it('keeps ordinary API answers out of every cache', async () => {
    const res = await ravi.get(`/api/designs/${id}`).expect(200);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.headers.etag).toBeUndefined();
  });

  it('tags a version with a strong ETag and answers 304 to a matching If-None-Match, without a body', async () => {
    const first = await ravi.get(`/api/designs/${id}/versions/2`).expect(200);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^"[^"]+"$/); // strong: no W/ prefix
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const again = await ravi.get(`/api/designs/${id}/versions/2`).set('If-None-Match', tag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
    expect(again.headers.etag).toBe(tag);
    // A list of tags matches when one of them does; a weak form of the same tag too (weak comparison, §13.1.2).
    await ravi.get(`/api/designs/${id}/versions/2`).set('If-None-Match', `"other", ${tag}`).expect(304);
    await ravi.get(`/api/designs/${id}/versions/2`).set('If-None-Match', `W/${tag}`).expect(304);
    const other = await ravi.get(`/api/designs/${id}/versions/2`).set('If-None-Match', '"something-else"');
    expect(other.status).toBe(200);
    expect(other.body.version.number).toBe(2);
  });

  it('gives each version and each kind of answer its own tag', async () => {
    const v1 = (await ravi.get(`/api/designs/${id}/versions/1`).expect(200)).headers.etag;
    const v2 = (await ravi.get(`/api/designs/${id}/versions/2`).expect(200)).headers.etag;
    const r2 = (await ravi.get(`/api/designs/${id}/versions/2/report`).expect(200)).headers.etag;
    const p2 = (await ravi.get(`/api/designs/${id}/versions/2/report-page`).expect(200)).headers.etag;
    expect(new Set([v1, v2, r2, p2]).size).toBe(4);
    await ravi.get(`/api/designs/${id}/versions/1`).set('If-None-Match', v2).expect(200);
  });

  it('changes the version tag when its review moves on, and keeps the stored report tag', async () => {
    const saved = await saveOnTop(ravi, id, harborV2(), 'A version to submit');
    expect(saved.status).toBe(201);
    const n = saved.body.version.number as number;
    const before = (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).headers.etag;
    const report = (await ravi.get(`/api/designs/${id}/versions/${n}/report`).expect(200)).headers.etag;
    await ravi.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'submit' }).expect(200);
    const after = await ravi.get(`/api/designs/${id}/versions/${n}`).set('If-None-Match', before);
    expect(after.status).toBe(200);
    expect(after.body.version.review.state).toBe('in-review');
    expect(after.headers.etag).not.toBe(before);
    await ravi.get(`/api/designs/${id}/versions/${n}/report`).set('If-None-Match', report).expect(304);
  });

  it('checks who is asking before it answers 304: another team gets 404 with the right tag', async () => {
    const tag = (await ravi.get(`/api/designs/${id}/versions/2`).expect(200)).headers.etag;
    const quinn = await signInQuaysideAdmin(t);
    const res = await quinn.get(`/api/designs/${id}/versions/2`).set('If-None-Match', tag);
    expect(res.status).toBe(404);
    expect(res.headers.etag).toBeUndefined();
    await request(t.app).get(`/api/designs/${id}/versions/2`).set('If-None-Match', tag).expect(401);
  });

  it('answers the report screen in one request: the design, the version with its document, the report', async () => {
    const page = await ravi.get(`/api/designs/${id}/versions/2/report-page`).expect(200);
    const design = await ravi.get(`/api/designs/${id}`).expect(200);
    const version = await ravi.get(`/api/designs/${id}/versions/2`).expect(200);
    const report = await ravi.get(`/api/designs/${id}/versions/2/report`).expect(200);
    expect(Object.keys(page.body).sort()).toEqual(['design', 'report', 'summary', 'version']);
    expect(page.body.design).toEqual(design.body.design);
    expect(page.body.version).toEqual(version.body.version);
    expect(page.body.report).toEqual(report.body.report);
    expect(page.body.summary).toEqual(report.body.summary);
    await ravi.get(`/api/designs/${id}/versions/2/report-page`).set('If-None-Match', page.headers.etag).expect(304);
    await ravi.get(`/api/designs/${id}/versions/99/report-page`).expect(404);
  });
});

describe('the web app', () => {
  let dir: string;
  let t: TestApp;
  const bundle = `console.log(${JSON.stringify('a fairly long bundle line '.repeat(200))});`;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'cw-web-cache-'));
    mkdirSync(path.join(dir, '_expo/static/js/web'), { recursive: true });
    mkdirSync(path.join(dir, 'assets/fonts'), { recursive: true });
    writeFileSync(path.join(dir, 'index.html'), `<!doctype html><title>Cablewright cache shell</title>${'<!-- padding -->'.repeat(100)}`);
    writeFileSync(path.join(dir, '_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js'), bundle);
    writeFileSync(path.join(dir, 'assets/fonts/Inter.4f9a1c2b3d4e5f60718293a4b5c6d7e8.ttf'), 'font bytes');
    writeFileSync(path.join(dir, 'favicon.ico'), 'icon');
    t = await makeTestApp({ env: { WEB_DIR: dir }, seed: false });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('marks hashed files immutable for a year and everything else no-cache', async () => {
    const js = await request(t.app).get('/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js').expect(200);
    expect(js.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const font = await request(t.app).get('/assets/fonts/Inter.4f9a1c2b3d4e5f60718293a4b5c6d7e8.ttf').expect(200);
    expect(font.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    for (const url of ['/favicon.ico', '/', '/designs/4/report']) {
      const res = await request(t.app).get(url).expect(200);
      expect([url, res.headers['cache-control']]).toEqual([url, 'no-cache']);
    }
  });

  it('compresses the page and the bundles', async () => {
    const js = await rawGet(t.app, '/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js', 'gzip, br');
    expect(js.headers['content-encoding']).toBe('br');
    expect(brotliDecompressSync(js.body).toString('utf8')).toBe(bundle);
    expect(js.body.length).toBeLessThan(bundle.length / 10);
    const page = await request(t.app).get('/designs').set('Accept-Encoding', 'gzip').expect(200);
    expect(page.headers['content-encoding']).toBe('gzip');
    expect(page.text).toContain('Cablewright cache shell');
  });

  it('lets the browser revalidate the page: 304 on its ETag', async () => {
    const page = await request(t.app).get('/index.html').expect(200);
    expect(page.headers.etag).toBeDefined();
    await request(t.app).get('/index.html').set('If-None-Match', page.headers.etag).expect(304);
  });
});
