import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveAndSubmit } from './helpers/designs';

/**
 * Installers see approved versions only (docs/api.md). Decided here: a version that is not approved
 * answers 404, exactly like one that does not exist; a design without an approved version is not
 * listed and answers 404; to an installer a design they can open reads as approved, and its latest
 * version is its newest approved one. (RFC 9110 §15.5.5: a 404 need not say whether the thing exists.)
 */
let t: TestApp;
let ines: Agent;
let ravi: Agent;
let theo: Agent;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  [ines, ravi, theo] = await Promise.all([signInAs(t.app, 'installer'), signInAs(t.app, 'designer'), signInAs(t.app, 'reviewer')]);
  id = await designId(t);
});
afterEach(() => t.close());

describe('what an installer sees', () => {
  it('sees only the approved v2 of the seeded demo', async () => {
    const { design, versions } = (await ines.get(`/api/designs/${id}`).expect(200)).body;
    expect(design.status).toBe('approved');
    expect(versions.map((v: { number: number }) => v.number)).toEqual([2]);
    await ines.get(`/api/designs/${id}/versions/2`).expect(200);
    await ines.get(`/api/designs/${id}/versions/2/report`).expect(200);
    const v1 = await ines.get(`/api/designs/${id}/versions/1`);
    const v99 = await ines.get(`/api/designs/${id}/versions/99`);
    expect(v1.status).toBe(404);
    expect(v1.body).toEqual({ error: 'This design has no version 1.' });
    expect(v99.body).toEqual({ error: 'This design has no version 99.' });
    await ines.get(`/api/designs/${id}/versions/2/diff?against=1`).expect(404);
  });

  it('keeps seeing v2 as the latest while a newer version is in review, and the design as approved', async () => {
    const n = await saveAndSubmit(ravi, id);
    const [listed] = (await ines.get('/api/designs').expect(200)).body.designs;
    expect(listed).toMatchObject({ status: 'approved', latestVersion: { number: 2, review: 'approved' } });
    expect((await ravi.get('/api/designs').expect(200)).body.designs[0]).toMatchObject({ status: 'in-review', latestVersion: { number: n } });
    await ines.get(`/api/designs/${id}/versions/${n}`).expect(404);
  });

  it('sees a newly approved version as soon as it is approved', async () => {
    const n = await saveAndSubmit(ravi, id);
    await theo.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'approve' }).expect(200);
    const versions = (await ines.get(`/api/designs/${id}`).expect(200)).body.versions.map((v: { number: number }) => v.number);
    expect(versions).toEqual([n, 2]);
    const diff = await ines.get(`/api/designs/${id}/versions/${n}/diff?against=2`).expect(200);
    expect(diff.body.diff.empty).toBe(true);
  });

  it('does not see a design that has no approved version, not even that it exists', async () => {
    const created = await ravi.post('/api/designs').send({ name: 'Dock 4 chillers', document: harborV2() }).expect(201);
    const names = (await ines.get('/api/designs').expect(200)).body.designs.map((d: { name: string }) => d.name);
    expect(names).toEqual(['Harbor Road storage']);
    const hidden = await ines.get(`/api/designs/${created.body.design.id}`);
    const missing = await ines.get('/api/designs/999999');
    expect(hidden.status).toBe(404);
    expect(hidden.body).toEqual(missing.body);
  });
});
