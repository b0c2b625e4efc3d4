import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2, saveAndSubmit, saveOnTop, type Issue } from './helpers/designs';

let t: TestApp;
let ravi: Agent;
let theo: Agent;
let maya: Agent;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  [ravi, theo, maya] = await Promise.all([signInAs(t.app, 'designer'), signInAs(t.app, 'reviewer'), signInAs(t.app, 'admin')]);
  id = await designId(t);
});
afterEach(() => t.close());

const review = (agent: Agent, n: number, body: Record<string, unknown>) => agent.post(`/api/designs/${id}/versions/${n}/review`).send(body);
const status = async () => (await ravi.get(`/api/designs/${id}`).expect(200)).body.design.status as string;
const stateOf = async (n: number) => (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).body.version.review.state as string;
const paths = (body: { issues?: Issue[] }) => (body.issues ?? []).map((i) => i.path);

describe('the review of a version, step by step', () => {
  it('moves a version through submit, changes asked, a new version, submit and approval; the design follows', async () => {
    expect(await status()).toBe('approved');
    const v3 = (await saveOnTop(ravi, id, harborV1(), 'Try one switch less')).body.version.number;
    expect(v3).toBe(3);
    // A new draft does not change the status: it follows the latest *reviewed* version (v2).
    expect(await status()).toBe('approved');

    const submitted = await review(ravi, v3, { action: 'submit', comment: 'Cheaper variant for the camera hosts.' });
    expect(submitted.status).toBe(200);
    expect(submitted.body.review).toMatchObject({ state: 'in-review', events: [{ action: 'submit', actor: { name: 'Ravi Menon' }, comment: 'Cheaper variant for the camera hosts.', override: false }] });
    expect(submitted.body.design.status).toBe('in-review');
    expect(await status()).toBe('in-review');

    const sentBack = await review(theo, v3, { action: 'request-changes', comment: 'cam-rec-2 lost its fabric B cable again.' });
    expect(sentBack.status).toBe(200);
    expect(sentBack.body.review.state).toBe('changes-requested');
    expect(sentBack.body.review.events.map((e: { action: string }) => e.action)).toEqual(['submit', 'request-changes']);
    expect(await status()).toBe('changes-requested');

    const v4 = await saveAndSubmit(ravi, id, harborV2());
    expect(await status()).toBe('in-review');
    const approved = await review(theo, v4, { action: 'approve' });
    expect(approved.status).toBe(200);
    expect(approved.body.review.state).toBe('approved');
    expect(approved.body.design.status).toBe('approved');
    expect(await stateOf(3)).toBe('changes-requested');
    const listed = (await ravi.get('/api/designs').expect(200)).body.designs[0];
    expect(listed).toMatchObject({ status: 'approved', latestVersion: { number: 4, review: 'approved' } });
  });

  it('keeps the status on the highest reviewed version when an older one in review is decided later', async () => {
    const v3 = await saveAndSubmit(ravi, id);
    await saveOnTop(ravi, id, harborV2(), 'Labels for the new cables');
    // v4 is a draft: the design is still "in review" because of v3.
    expect(await status()).toBe('in-review');
    await review(theo, v3, { action: 'approve' }).expect(200);
    expect(await status()).toBe('approved');
    await review(ravi, 4, { action: 'submit' }).expect(200);
    expect(await status()).toBe('in-review');
  });
});

describe('steps in the wrong state answer 409', () => {
  // RFC 9110 §15.5.10: 409 Conflict — the version's current state does not allow the step.
  it('refuses submitting a version that is approved, sent back or already in review', async () => {
    const approvedV2 = await review(ravi, 2, { action: 'submit' });
    expect(approvedV2.status).toBe(409);
    expect(approvedV2.body.error).toMatch(/Version 2 is approved; only a draft can be submitted/);
    expect((await review(ravi, 1, { action: 'submit' })).status).toBe(409);
    const v3 = await saveAndSubmit(ravi, id);
    expect((await review(ravi, v3, { action: 'submit' })).status).toBe(409);
  });

  it('refuses submitting a draft that is no longer the latest version', async () => {
    await saveOnTop(ravi, id, harborV2(), 'First try');
    await saveOnTop(ravi, id, harborV2(), 'Second try');
    const res = await review(ravi, 3, { action: 'submit' });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/not the latest; submit version 4/);
    await review(ravi, 4, { action: 'submit' }).expect(200);
  });

  it.each(['approve', 'request-changes'])('refuses %s on a draft, an approved and a sent-back version', async (action) => {
    const draft = (await saveOnTop(ravi, id, harborV2())).body.version.number;
    for (const n of [draft, 2, 1]) {
      const res = await review(theo, n, { action, comment: 'Looks fine to me.' });
      expect([n, res.status]).toEqual([n, 409]);
      expect(res.body.error).toMatch(/only a version in review can be approved or sent back/);
    }
  });
});

describe('nobody reviews their own version', () => {
  it('answers 403 with a sentence when an admin approves or sends back a version they saved', async () => {
    const n = await saveAndSubmit(maya, id);
    for (const action of ['approve', 'request-changes']) {
      const res = await review(maya, n, { action, comment: 'Fine by me.' });
      // RFC 9110 §15.5.4: 403 Forbidden — understood, and refused for this person.
      expect(res.status).toBe(403);
      expect(res.body.error).toBe(`You saved version ${n} yourself, so someone else has to review it.`);
    }
    expect(await stateOf(n)).toBe('in-review');
    await review(theo, n, { action: 'approve' }).expect(200);
  });

  it('lets an admin review a version someone else saved', async () => {
    const n = await saveAndSubmit(ravi, id);
    const res = await review(maya, n, { action: 'approve' });
    expect(res.status).toBe(200);
    expect(res.body.review.events[1].actor.name).toBe('Maya Okafor');
  });

  it('answers 403 when a designer restores the admin’s version and the admin tries to approve that same content', async () => {
    const doc = harborV1();
    doc.cables[0].lengthM = 4;
    const mine = (await saveOnTop(maya, id, doc, 'Shorter first cable')).body.version.number as number;
    await saveOnTop(ravi, id, harborV2(), 'Back to the approved layout').then((res) => expect(res.status).toBe(201));
    const restored = await ravi.post(`/api/designs/${id}/versions/${mine}/restore`).send({ message: 'Shorter cable after all' }).expect(201);
    const n = restored.body.version.number as number;
    expect(restored.body.version.author.name).toBe('Ravi Menon');
    await review(ravi, n, { action: 'submit' }).expect(200);

    const res = await review(maya, n, { action: 'approve', comment: 'Ravi’s version, approved.' });
    // RFC 9110 §15.5.4: 403 Forbidden — the content is Maya's own work, whoever saved this copy.
    expect(res.status).toBe(403);
    expect(res.body.error).toBe(`Version ${n} has the same content as version ${mine}, which you saved, so someone else has to review it.`);
    expect(await stateOf(n)).toBe('in-review');
    await review(theo, n, { action: 'approve', comment: 'Checked by someone who did not draw it.' }).expect(200);
  });

  it('lets the admin review content that only looks like theirs but differs', async () => {
    const doc = harborV1();
    doc.cables[0].lengthM = 4;
    await saveOnTop(maya, id, doc, 'Shorter first cable');
    const other = harborV1();
    other.cables[0].lengthM = 5;
    const saved = await saveOnTop(ravi, id, other, 'A little longer');
    await review(ravi, saved.body.version.number, { action: 'submit' }).expect(200);
    await review(maya, saved.body.version.number, { action: 'request-changes', comment: 'Keep it at 4 m.' }).expect(200);
  });
});

describe('comments', () => {
  it('needs a comment to ask for changes: 400 with the path comment', async () => {
    const n = await saveAndSubmit(ravi, id);
    for (const body of [{ action: 'request-changes' }, { action: 'request-changes', comment: '   ' }]) {
      const res = await review(theo, n, body);
      // RFC 9110 §15.5.1: 400 Bad Request.
      expect(res.status).toBe(400);
      expect(paths(res.body)).toEqual(['comment']);
    }
    expect(await stateOf(n)).toBe('in-review');
  });

  it('needs a reason to approve a version with errors, and records the approval as an override', async () => {
    const n = await saveAndSubmit(ravi, id, harborV1());
    const listed = (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).body.version;
    expect(listed.summary.errors).toBeGreaterThan(0);
    const bare = await review(theo, n, { action: 'approve' });
    expect(bare.status).toBe(400);
    expect(paths(bare.body)).toEqual(['comment']);
    expect(bare.body.issues[0].message).toMatch(/found 2 errors in this version; explain why you approve it anyway/);
    const reason = 'Accepted for the pilot week: the second camera cable is pulled on Monday, ctl-b management moves with it.';
    const res = await review(theo, n, { action: 'approve', comment: `  ${reason}  ` });
    expect(res.status).toBe(200);
    expect(res.body.review.events[1]).toMatchObject({ action: 'approve', override: true, comment: reason });
    const stored = await t.models.ReviewEvent.findOne({ where: { action: 'approve' }, order: [['id', 'DESC']] });
    expect(stored?.override).toBe(true);
  });

  it('approves an error-free version without a comment, and that is no override', async () => {
    const n = await saveAndSubmit(ravi, id, harborV2());
    const res = await review(theo, n, { action: 'approve' });
    expect(res.status).toBe(200);
    expect(res.body.review.events[1]).toMatchObject({ override: false, comment: null });
  });

  it('names an unknown action and an overlong comment', async () => {
    const n = await saveAndSubmit(ravi, id);
    const res = await review(theo, n, { action: 'reject', comment: 'x'.repeat(4001) });
    expect(res.status).toBe(400);
    expect(paths(res.body).sort()).toEqual(['action', 'comment']);
  });
});
