import request from 'supertest';
import { SENDER_NOT_ADMIN } from '@/server/services/invitations';
import { APP_ORIGIN, DEMO, DEMO_PASSWORD, makeTestApp, signInAs, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  t = await makeTestApp();
});
afterEach(() => t.close());

const NEW_PASSWORD = 'cold-aisle-42-spare';

async function idOf(email: string): Promise<number> {
  const user = await t.models.User.findOne({ where: { email } });
  if (!user) throw new Error(`no demo user ${email}`);
  return user.id;
}

async function removeRavi() {
  const admin = await signInAs(t.app, 'admin');
  const id = await idOf(DEMO.designer);
  await admin.delete(`/api/team/members/${id}`).expect(204);
  return { admin, id };
}

describe('removing a member keeps their name on their work', () => {
  it('keeps the row, marks it removed, and ends every session of theirs', async () => {
    const ravi = await signInAs(t.app, 'designer');
    await removeRavi();
    const row = await t.models.User.findOne({ where: { email: DEMO.designer } });
    expect(row?.removedAt).toBeInstanceOf(Date);
    expect(await t.models.Session.count({ where: { userId: row?.id } })).toBe(0);
    await ravi.get('/api/auth/me').expect(401);
  });

  it('refuses the removed member’s sign-in with the same sentence as a wrong password', async () => {
    await removeRavi();
    const removed = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD });
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.reviewer, password: 'not-the-password' });
    // RFC 9110 §15.5.2: 401 Unauthorized; the same body, so the answer does not tell removed accounts apart.
    expect(removed.status).toBe(401);
    expect(removed.body).toEqual(wrong.body);
  });

  it('leaves them out of the members list and answers 404 when they are changed or removed again', async () => {
    const { admin, id } = await removeRavi();
    const members = (await admin.get('/api/team').expect(200)).body.members.map((m: { email: string }) => m.email);
    expect(members).not.toContain(DEMO.designer);
    await admin.patch(`/api/team/members/${id}`).send({ role: 'reviewer' }).expect(404);
    await admin.delete(`/api/team/members/${id}`).expect(404);
  });

  it('still names them as the author of the versions they saved and in the review thread', async () => {
    await removeRavi();
    const theo = await signInAs(t.app, 'reviewer');
    const design = (await theo.get('/api/designs').expect(200)).body.designs[0];
    const res = await theo.get(`/api/designs/${design.id}`).expect(200);
    expect(res.body.versions.map((v: { author: { name: string } }) => v.author.name)).toEqual(['Ravi Menon', 'Ravi Menon']);
    const submitters = res.body.versions.map((v: { review: { events: Array<{ action: string; actor: { name: string } }> } }) =>
      v.review.events.find((e) => e.action === 'submit')?.actor.name,
    );
    expect(submitters).toEqual(['Ravi Menon', 'Ravi Menon']);
  });

  it('brings the same account back when this team invites the address again', async () => {
    const { admin, id } = await removeRavi();
    await admin.post('/api/team/invitations').send({ email: DEMO.designer, role: 'reviewer' }).expect(201);
    const mail = (await admin.get('/api/dev/mail').expect(200)).body.messages.find((m: { to: string[] }) => m.to.includes(DEMO.designer));
    const token = new RegExp(`${APP_ORIGIN}/invitations/([A-Za-z0-9_-]{43})`).exec(mail?.text ?? '')?.[1];
    const accepted = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Ravi Menon', password: NEW_PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({ id, email: DEMO.designer, role: 'reviewer' });
    await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: NEW_PASSWORD }).expect(200);
    // The old password no longer works: the account came back with the one chosen on accepting.
    await request(t.app).post('/api/auth/sign-in').send({ email: DEMO.designer, password: DEMO_PASSWORD }).expect(401);
  });

  it('does not let another team invite an address whose removed account belongs to this team', async () => {
    await removeRavi();
    const sam = await t.models.User.findOne({ where: { email: DEMO.otherTeam } });
    await sam?.update({ role: 'admin' });
    const quayside = await signInAs(t.app, 'otherTeam');
    const res = await quayside.post('/api/team/invitations').send({ email: DEMO.designer, role: 'designer' });
    // RFC 9110 §15.5.10: 409 Conflict — one account belongs to one team.
    expect(res.status).toBe(409);
  });
});

describe('invitations sent by a member who was removed', () => {
  it('stop working, leave the pending list, and their link says why', async () => {
    const admin = await signInAs(t.app, 'admin');
    const theoId = await idOf(DEMO.reviewer);
    await admin.patch(`/api/team/members/${theoId}`).send({ role: 'admin' }).expect(200);
    const theo = await signInAs(t.app, 'reviewer');
    await theo.post('/api/team/invitations').send({ email: 'new.person@tidewater.example', role: 'admin' }).expect(201);
    const mail = (await admin.get('/api/dev/mail').expect(200)).body.messages.find((m: { to: string[] }) => m.to.includes('new.person@tidewater.example'));
    const token = /\/invitations\/([A-Za-z0-9_-]{43})/.exec(mail?.text ?? '')?.[1];
    await admin.delete(`/api/team/members/${theoId}`).expect(204);
    expect((await admin.get('/api/team').expect(200)).body.invitations).toEqual([]);
    const res = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'New Person', password: NEW_PASSWORD });
    expect(res.status).toBe(404);
    expect(res.body.error).toBe(SENDER_NOT_ADMIN);
    expect(await t.models.User.count({ where: { email: 'new.person@tidewater.example' } })).toBe(0);
  });
});
