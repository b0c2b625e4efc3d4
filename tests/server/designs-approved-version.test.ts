import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveAndSubmit, saveOnTop } from './helpers/designs';

let t: TestApp;
let ravi: Agent;
let theo: Agent;
let ines: Agent;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  [ravi, theo, ines] = await Promise.all([signInAs(t.app, 'designer'), signInAs(t.app, 'reviewer'), signInAs(t.app, 'installer')]);
  id = await designId(t);
});
afterEach(() => t.close());

/** The demo has v1 (changes asked) and v2 (approved); this adds v3, approved, and v4, a draft. */
async function approvedThreeDraftFour() {
  const doc = harborV2();
  doc.name = 'Harbor Road storage, spare port labelled';
  const v3 = await saveAndSubmit(ravi, id, doc);
  expect(v3).toBe(3);
  await theo.post(`/api/designs/${id}/versions/3/review`).send({ action: 'approve' }).expect(200);
  doc.name = 'Harbor Road storage, next step';
  expect((await saveOnTop(ravi, id, doc, 'Next step after the approval')).status).toBe(201);
}

describe('the approved version beside the latest one', () => {
  it('is carried by the designs list and the design, so a newer draft never hides the approval', async () => {
    await approvedThreeDraftFour();
    const list = (await ravi.get('/api/designs').expect(200)).body.designs;
    const item = list.find((d: { id: number }) => d.id === id);
    expect(item.latestVersion).toMatchObject({ number: 4, review: 'draft' });
    expect(item.approvedVersion).toEqual({ number: 3, approvedAt: expect.any(String) });
    expect(Date.parse(item.approvedVersion.approvedAt)).not.toBeNaN();
    expect(item.status).toBe('approved'); // the status follows the latest reviewed version (v3)

    const one = (await ravi.get(`/api/designs/${id}`).expect(200)).body;
    expect(one.design.approvedVersion).toEqual(item.approvedVersion);
    expect(one.versions[0].number).toBe(4);
  });

  it('names the approval, not the version’s save time', async () => {
    await approvedThreeDraftFour();
    const { design, versions } = (await ravi.get(`/api/designs/${id}`).expect(200)).body;
    const three = versions.find((v: { number: number }) => v.number === 3);
    const approval = three.review.events.find((e: { action: string }) => e.action === 'approve');
    expect(design.approvedVersion.approvedAt).toBe(approval.createdAt);
  });

  it('is null for a design never approved, and the approved one for an installer, who sees no drafts', async () => {
    const fresh = (await ravi.post('/api/designs').send({ name: 'Loading dock', document: harborV2() }).expect(201)).body.design;
    expect(fresh.approvedVersion).toBeNull();
    await approvedThreeDraftFour();
    const item = (await ines.get('/api/designs').expect(200)).body.designs.find((d: { id: number }) => d.id === id);
    expect(item.latestVersion.number).toBe(3);
    expect(item.approvedVersion.number).toBe(3);
  });
});
