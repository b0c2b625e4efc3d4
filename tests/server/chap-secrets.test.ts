import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { RevealedSecret } from '@/shared/api/secrets';
import { makeTestApp, signInAs, type Agent, type DemoWho, type TestApp } from './helpers/app';
import { designId, harborV2, saveOnTop } from './helpers/designs';

/**
 * CHAP secrets (api.md): made by admins and designers, shown to admins and installers with each
 * showing recorded, 403 for designers and reviewers, 404 for another team; stored only sealed.
 * The seeded demo's latest Harbor Road version (2, approved) uses mutual CHAP and has six hosts.
 * The database is a file here, so the test can read its raw bytes.
 */
let t: TestApp;
let id: number;
let folder: string;
const agents = new Map<DemoWho, Agent>();
const as = (who: DemoWho) => agents.get(who)!;
const url = () => `/api/designs/${id}/secrets`;

beforeAll(async () => {
  folder = mkdtempSync(path.join(tmpdir(), 'cw-secrets-'));
  t = await makeTestApp({ databasePath: path.join(folder, 'cablewright.sqlite') });
  id = await designId(t);
  for (const who of ['admin', 'designer', 'reviewer', 'installer', 'otherTeam'] as const) agents.set(who, await signInAs(t.app, who));
});
afterAll(async () => {
  await t.close();
  rmSync(folder, { recursive: true, force: true });
});

const HOSTS = ['wms-db-1', 'wms-db-2', 'wms-app-1', 'wms-app-2', 'cam-rec-1', 'cam-rec-2'];
let first: RevealedSecret[] = [];

describe('making and showing CHAP secrets', () => {
  it('refuses anyone outside the team (404) and the roles that may not make them (403)', async () => {
    expect((await request(t.app).post(url()).send({})).status).toBe(401);
    const sam = await as('otherTeam').post(url()).send({});
    expect(sam.status).toBe(404);
    expect((await as('reviewer').post(url()).send({})).status).toBe(403);
    expect((await as('installer').post(url()).send({})).status).toBe(403);
    expect(await t.models.ChapSecret.count()).toBe(0);
  });

  it('validates the body with field paths: at least 16 characters (96 bits, RFC 7143 §9.2.1)', async () => {
    const short = await as('designer').post(url()).send({ length: 12 });
    expect(short.status).toBe(400);
    expect(short.body.issues.map((i: { path: string }) => i.path)).toEqual(['length']);
    expect((await as('designer').post(url()).send({ length: 'long' })).status).toBe(400);
    const extra = await as('designer').post(url()).send({ secret: 'mine' });
    expect(extra.status).toBe(400);
    expect((await as('designer').post('/api/designs/abc/secrets').send({})).body.issues[0].path).toBe('params.id');
  });

  it('makes one secret per host and, for mutual CHAP, a second one per host for the target', async () => {
    const made = await as('designer').post(url()).send({});
    expect(made.status).toBe(201);
    expect(made.body.generated).toMatchObject({ hosts: 6, secrets: 12, length: 16, mode: 'mutual', version: 2 });
    expect(JSON.stringify(made.body)).not.toMatch(/"secret"/);
  });

  it('shows them to an admin: 16 characters of a 64-character alphabet, all distinct, per host and direction', async () => {
    const shown = await as('admin').get(url());
    expect(shown.status).toBe(200);
    expect(shown.headers['cache-control']).toBe('no-store');
    first = shown.body.secrets;
    expect(first).toHaveLength(12);
    for (const { secret } of first) {
      // 16 characters × 6 bits = 96 bits, RFC 7143 §9.2.1's minimum without IPsec (check-values.md).
      expect(secret).toMatch(/^[A-Za-z0-9_-]{16}$/);
    }
    expect(new Set(first.map((s) => s.secret)).size).toBe(12); // RFC 7143 §9.2.1: never the same secret both ways or for two initiators
    for (const host of HOSTS) {
      expect(first.filter((s) => s.host === host).map((s) => s.direction).sort()).toEqual(['initiator', 'target']);
    }
    // Over all 192 characters every one of the 64 symbols is likely; at the least far more than a hex alphabet's 16.
    expect(new Set(first.flatMap((s) => [...s.secret])).size).toBeGreaterThan(16);
  });

  it('shows one host’s secrets to an installer, and refuses designers and reviewers (403) and other teams (404)', async () => {
    const one = await as('installer').get(`${url()}?host=wms-db-1`);
    expect(one.status).toBe(200);
    expect(one.body.secrets.map((s: RevealedSecret) => [s.host, s.name, s.direction])).toEqual([
      ['wms-db-1', 'wms-db-1', 'initiator'],
      ['wms-db-1', 'wms-db-1', 'target'],
    ]);
    expect((await as('installer').get(`${url()}?host=nobody`)).status).toBe(404);
    for (const who of ['designer', 'reviewer'] as const) {
      const refused = await as(who).get(url());
      expect(refused.status).toBe(403);
      expect(JSON.stringify(refused.body)).not.toMatch(/"secret"/);
    }
    expect((await as('otherTeam').get(url())).status).toBe(404);
    expect((await request(t.app).get(url())).status).toBe(401);
  });

  it('records every showing: who, when, which host', async () => {
    const rows = await t.models.SecretReveal.findAll({ order: [['id', 'ASC']] });
    const maya = await t.models.User.findOne({ where: { email: 'maya@tidewater.example' } });
    const ines = await t.models.User.findOne({ where: { email: 'ines@tidewater.example' } });
    expect(rows.map((r) => [r.userId, r.hostId, r.count])).toEqual([
      [maya!.id, null, 12],
      [ines!.id, 'wms-db-1', 2],
    ]);
    for (const row of rows) expect(Date.now() - row.createdAt.getTime()).toBeLessThan(60_000);
    const status = (await as('designer').get(`${url()}/status`).expect(200)).body.status;
    expect(status.reveals.map((r: { by: { name: string }; host: string | null }) => [r.by.name, r.host])).toEqual([
      ['Ines Duarte', 'wms-db-1'],
      ['Maya Okafor', null],
    ]);
    expect(JSON.stringify(status)).not.toContain(first[0].secret);
    await expect(rows[0].update({ count: 0 })).rejects.toThrow();
  });

  it('keeps them out of the SQLite file: only sealed text is stored', async () => {
    await t.sequelize.query('PRAGMA wal_checkpoint(FULL)');
    const files = readdirSync(folder).filter((f) => f.startsWith('cablewright.sqlite'));
    const bytes = Buffer.concat(files.map((f) => readFileSync(path.join(folder, f))));
    // The read sees the data: the design's name is stored as plain text.
    expect(bytes.includes(Buffer.from('Harbor Road storage'))).toBe(true);
    for (const { secret } of first) {
      expect(bytes.includes(Buffer.from(secret, 'utf8'))).toBe(false);
      expect(bytes.includes(Buffer.from(secret, 'utf16le'))).toBe(false);
    }
    const stored = await t.models.ChapSecret.findAll();
    expect(stored).toHaveLength(12);
    for (const row of stored) expect(first.some((s) => row.sealed.includes(s.secret))).toBe(false);
  });

  it('keeps them out of every document, export and e-mail', async () => {
    const routes = ['', '/versions/2', '/versions/2/report', '/versions/2/cables', '/versions/2/cables.csv', '/versions/2/addresses.csv', '/versions/2/login-plan', '/versions/2/build', '/versions/2/build/checklist'];
    for (const route of routes) {
      const res = await as('admin').get(`/api/designs/${id}${route}`);
      expect(res.status).toBe(200);
      for (const { secret } of first) expect(res.text).not.toContain(secret);
    }
    const mail = await as('admin').get('/api/dev/mail');
    for (const { secret } of first) expect(JSON.stringify(mail.body)).not.toContain(secret);
  });

  it('makes new ones on request, longer if asked, and says the old ones work until changed on the devices', async () => {
    const again = await as('admin').post(url()).send({ length: 24 });
    expect(again.status).toBe(201);
    expect(again.body.notice).toMatch(/old secrets keep working on the hosts and the array until they are changed there/);
    const next: RevealedSecret[] = (await as('admin').get(url()).expect(200)).body.secrets;
    expect(next).toHaveLength(12);
    for (const { secret } of next) expect(secret).toMatch(/^[A-Za-z0-9_-]{24}$/);
    const old = new Set(first.map((s) => s.secret));
    expect(next.some((s) => old.has(s.secret))).toBe(false);
    expect(await t.models.ChapSecret.count()).toBe(12);
  });

  it('refuses to make secrets when the latest version has CHAP off', async () => {
    const doc = harborV2();
    doc.security = { chap: 'none' };
    expect((await saveOnTop(as('designer'), id, doc, 'CHAP off for a test')).status).toBe(201);
    const refused = await as('designer').post(url()).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/CHAP is off in version 3/);
  });
});
