import { createHash } from 'node:crypto';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { dualFabricWithManagement } from '@/shared/patterns';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2, type Issue } from './helpers/designs';

let t: TestApp;
let ravi: Agent;
beforeEach(async () => {
  t = await makeTestApp();
  ravi = await signInAs(t.app, 'designer');
});
afterEach(() => t.close());

const paths = (body: { issues?: Issue[] }) => (body.issues ?? []).map((i) => i.path);

/** Reverse the key order of every object: the same document written by a different tool. */
function reorderKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(reorderKeys);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(Object.entries(value).reverse().map(([k, v]) => [k, reorderKeys(v)]));
}

describe('creating a design', () => {
  it('without a document: 201, a draft with no versions', async () => {
    const res = await ravi.post('/api/designs').send({ name: 'Cold room 2 storage', site: 'Dock 4' });
    // RFC 9110 §15.3.2: 201 Created.
    expect(res.status).toBe(201);
    expect(res.body.design).toMatchObject({ name: 'Cold room 2 storage', site: 'Dock 4', status: 'draft', createdBy: { name: 'Ravi Menon' } });
    expect(res.body.version).toBeNull();
    expect((await ravi.get(`/api/designs/${res.body.design.id}`).expect(200)).body.versions).toEqual([]);
  });

  it('with a document: version 1 with the default message and the analysis summary of that document', async () => {
    const doc = harborV1();
    const res = await ravi.post('/api/designs').send({ name: 'Cold room 2 storage', document: doc }).expect(201);
    expect(res.body.version).toMatchObject({ number: 1, message: 'First version', author: { name: 'Ravi Menon' }, review: { state: 'draft', events: [] } });
    expect(res.body.version.summary).toEqual(summarize(analyze(doc), doc));
    const named = await ravi.post('/api/designs').send({ name: 'Cold room 3', document: doc, message: 'Copied from Harbor Road' }).expect(201);
    expect(named.body.version.message).toBe('Copied from Harbor Road');
  });

  it('refuses a bad document with 400 and paths into the body, and writes no design', async () => {
    const doc = harborV1() as unknown as { devices: Array<{ id: string }> };
    doc.devices[5].id = doc.devices[4].id;
    const before = await t.models.Design.count();
    const res = await ravi.post('/api/designs').send({ name: 'Broken', document: doc });
    // RFC 9110 §15.5.1: 400 Bad Request.
    expect(res.status).toBe(400);
    expect(paths(res.body)).toContain('document.devices.5.id');
    expect(await t.models.Design.count()).toBe(before);
  });

  it('names a blank name and an overlong site', async () => {
    const res = await ravi.post('/api/designs').send({ name: '   ', site: 'x'.repeat(121) });
    expect(res.status).toBe(400);
    expect(paths(res.body).sort()).toEqual(['name', 'site']);
  });
});

describe('listing and searching designs', () => {
  it('answers the docs/api.md fields with the latest version and its summary', async () => {
    const res = await ravi.get('/api/designs').expect(200);
    expect(res.body.designs).toEqual([
      {
        id: await designId(t),
        name: 'Harbor Road storage',
        site: 'Harbor Road server room',
        status: 'approved',
        latestVersion: { number: 2, createdAt: expect.any(String), summary: expect.objectContaining({ errors: 0 }), review: 'approved' },
        approvedVersion: { number: 2, approvedAt: expect.any(String) },
        updatedAt: expect.any(String),
      },
    ]);
    expect(res.body.nextCursor).toBeNull();
    expect(res.body.total).toBe(1);
  });

  it('matches q against name or site, ignoring case, and treats % and _ as plain characters', async () => {
    await ravi.post('/api/designs').send({ name: 'Dock 4 chillers', site: 'Überseehafen 100%' }).expect(201);
    const names = async (q: string) =>
      (await ravi.get('/api/designs').query({ q }).expect(200)).body.designs.map((d: { name: string }) => d.name).sort();
    expect(await names('harbor')).toEqual(['Harbor Road storage']);
    expect(await names('SERVER ROOM')).toEqual(['Harbor Road storage']);
    expect(await names('übersee')).toEqual(['Dock 4 chillers']);
    expect(await names('100%')).toEqual(['Dock 4 chillers']);
    expect(await names('%')).toEqual(['Dock 4 chillers']);
    expect(await names('_')).toEqual([]);
    expect(await names('')).toEqual(['Dock 4 chillers', 'Harbor Road storage']);
  });

  it('refuses an unknown query parameter with its path', async () => {
    const res = await ravi.get('/api/designs').query({ sort: 'name' });
    expect(res.status).toBe(400);
    expect(paths(res.body)).toEqual(['query']);
  });
});

describe('saving a version', () => {
  it('adds the next number on top of the latest and stores the document as sent', async () => {
    const id = await designId(t);
    const doc = harborV2();
    doc.cables[0].lengthM = 9;
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Longer first cable', document: doc });
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 3, message: 'Longer first cable', review: { state: 'draft' } });
    const read = await ravi.get(`/api/designs/${id}/versions/3`).expect(200);
    expect(read.body.version.document).toEqual(doc);
    const design = (await ravi.get(`/api/designs/${id}`).expect(200)).body;
    expect(design.versions.map((v: { number: number }) => v.number)).toEqual([3, 2, 1]);
    // The design status follows its latest reviewed version (v2, approved); the new draft does not change it.
    expect(design.design.status).toBe('approved');
    expect(Date.parse(design.design.updatedAt)).toBeGreaterThanOrEqual(Date.parse(res.body.version.createdAt));
  });

  it('answers 409 with latestVersion when the base is not the latest, and writes nothing', async () => {
    const id = await designId(t);
    const before = await t.models.DesignVersion.count();
    for (const baseVersion of [1, null, 7]) {
      const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion, message: 'Stale', document: harborV2() });
      // RFC 9110 §15.5.10: 409 Conflict — the request conflicts with the resource's current state.
      expect(res.status).toBe(409);
      expect(res.body).toEqual({ error: expect.stringContaining('Version 2'), latestVersion: 2 });
    }
    expect(await t.models.DesignVersion.count()).toBe(before);
  });

  it('takes baseVersion null for the first version of an empty design, and refuses a number there', async () => {
    const id = (await ravi.post('/api/designs').send({ name: 'Empty' }).expect(201)).body.design.id;
    const wrong = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 1, message: 'First', document: harborV1() });
    expect(wrong.status).toBe(409);
    expect(wrong.body.latestVersion).toBeNull();
    const first = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: null, message: 'First', document: harborV1() });
    expect(first.status).toBe(201);
    expect(first.body.version.number).toBe(1);
  });

  it('names missing, wrongly typed and unknown body fields', async () => {
    const id = await designId(t);
    const missing = await ravi.post(`/api/designs/${id}/versions`).send({});
    expect(missing.status).toBe(400);
    expect(paths(missing.body).sort()).toEqual(['baseVersion', 'document', 'message']);
    const typed = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: '2', message: 5, document: harborV2(), draft: true });
    expect(typed.status).toBe(400);
    expect(paths(typed.body).sort()).toEqual(['', 'baseVersion', 'message']);
  });

  it('lists every problem of the document with paths prefixed document.', async () => {
    const id = await designId(t);
    const doc = harborV1() as unknown as Record<string, unknown> & { devices: any[]; cables: any[] };
    doc.devices[0].controllers[0].ports[0].speedGbps = '10';
    doc.extra = true;
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Bad', document: doc });
    expect(res.status).toBe(400);
    expect(paths(res.body)).toEqual(['document.devices.0.controllers.0.ports.0.speedGbps', 'document.extra']);
    const refs = harborV1() as unknown as { cables: Array<{ a: string }> };
    refs.cables[3].a = 'no-such-port';
    const dangling = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Bad', document: refs });
    expect(dangling.body.issues).toEqual([{ path: 'document.cables.3.a', message: expect.stringContaining('no-such-port') }]);
    const notObject = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Bad', document: 'a string' });
    expect(paths(notObject.body)).toEqual(['document']);
  });

  it('hashes the canonical JSON: the same document with keys in another order has the same hash', async () => {
    const id = await designId(t);
    const doc = harborV2();
    const a = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Same', document: doc }).expect(201);
    const b = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 3, message: 'Same, reordered', document: reorderKeys(doc) }).expect(201);
    expect(a.body.version.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(b.body.version.contentHash).toBe(a.body.version.contentHash);
    const v1 = (await ravi.get(`/api/designs/${id}`).expect(200)).body.versions.find((v: { number: number }) => v.number === 1);
    expect(v1.contentHash).not.toBe(a.body.version.contentHash);
    // An independent canonical form: JSON.stringify with the sorted key list of every object.
    const keys = new Set<string>();
    JSON.stringify(doc, (k, v) => (keys.add(k), v));
    const canonical = JSON.stringify(doc, [...keys].filter(Boolean).sort());
    expect(a.body.version.contentHash).toBe(createHash('sha256').update(canonical).digest('hex'));
  });

  it('answers 413 for an 11 MB body and keeps answering afterwards', async () => {
    const id = await designId(t);
    const doc = { ...harborV2(), name: 'x'.repeat(11 * 1024 * 1024) };
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Huge', document: doc });
    // RFC 9110 §15.5.14: 413 Content Too Large; docs/api.md: documents up to 10 MB.
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/10 MB/);
    await ravi.get(`/api/designs/${id}`).expect(200);
  });

  it('accepts a document of a few megabytes under the limit: 2,000 hosts on two fabrics', async () => {
    const id = await designId(t);
    const big = dualFabricWithManagement({ name: 'Harbor Road, whole campus', hosts: 2000 });
    expect(JSON.stringify(big).length).toBeGreaterThan(2_500_000);
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Every host of the campus', document: big });
    expect(res.status).toBe(201);
    expect(res.body.version.summary.hosts).toBe(2000);
  });

  it('answers a document the analysis cannot finish with a sentence, never a 500', async () => {
    const id = await designId(t);
    const doc = harborV2();
    // 600 networks on one subnet: every pair overlaps (about 180,000 findings).
    doc.networks.push(...Array.from({ length: 600 }, (_, i) => ({ id: `copy-${i}`, name: `copy ${i}`, purpose: 'data' as const, cidr: '198.51.100.0/24' })));
    const log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 2, message: 'Many copies', document: doc });
    const logged = log.mock.calls.map((call) => call[0]);
    log.mockRestore();
    // RFC 9110 §15.5.21: 422 when the server understands the document but will not finish its analysis.
    expect([201, 422]).toContain(res.status);
    if (res.status === 422) {
      expect(res.body.issues).toEqual([{ path: 'document', message: expect.stringContaining('analysis could not finish') }]);
      expect(logged).toContain('Analysis failed on a submitted document:');
    }
    await ravi.get(`/api/designs/${id}`).expect(200);
  });
});
