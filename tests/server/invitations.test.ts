import request from 'supertest';
import { hashToken, INVITATION_GONE } from '@/server/services/invitations';
import { APP_ORIGIN, DEMO, makeTestApp, signInAs, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  t = await makeTestApp({ seed: 'people' });
});
afterEach(() => t.close());

type Agent = Awaited<ReturnType<typeof signInAs>>;
const NEW_PASSWORD = 'cold-aisle-42-spare';

/** Invite through the API, then read the link back out of the fake sink's mailbox via /api/dev/mail. */
async function inviteAndReadToken(admin: Agent, email: string, role = 'designer'): Promise<string> {
  await admin.post('/api/team/invitations').send({ email, role }).expect(201);
  const mail = await admin.get('/api/dev/mail').expect(200);
  const message = mail.body.messages.find((m: { to: string[] }) => m.to.includes(email));
  const match = new RegExp(`${APP_ORIGIN}/invitations/([A-Za-z0-9_-]{43})`).exec(message?.text ?? '');
  if (!match) throw new Error(`no invitation link in the mail to ${email}`);
  return match[1];
}

describe('invitation by e-mail, end to end through the local SMTP sink', () => {
  it('admin invites; the mail carries the link; the invitee previews, accepts and is signed in with the role', async () => {
    const admin = await signInAs(t.app, 'admin');
    const created = await admin.post('/api/team/invitations').send({ email: 'Lena.Park@Tidewater.example', role: 'reviewer' });
    // RFC 9110 §15.3.2: 201 Created.
    expect(created.status).toBe(201);
    expect(created.body.invitation).toMatchObject({ email: 'lena.park@tidewater.example', role: 'reviewer', invitedBy: { name: 'Maya Okafor' } });
    const days = (Date.parse(created.body.invitation.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const mail = await admin.get('/api/dev/mail').expect(200);
    const [message] = mail.body.messages;
    expect(message.to).toEqual(['lena.park@tidewater.example']);
    expect(message.subject).toContain('Tidewater Cold Storage');
    expect(message.text).toContain('Reviewer');
    expect(message.html).toContain('Accept the invitation');
    const token = /\/invitations\/([A-Za-z0-9_-]{43})/.exec(message.text)?.[1] ?? '';
    expect(token).toHaveLength(43);
    // Only the token's sha256 is stored.
    expect(await t.models.Invitation.count({ where: { tokenHash: hashToken(token) } })).toBe(1);
    expect(JSON.stringify(await t.models.Invitation.findAll({ raw: true }))).not.toContain(token);

    const preview = await request(t.app).get(`/api/invitations/${token}`).expect(200);
    expect(preview.body.invitation).toEqual({
      email: 'lena.park@tidewater.example',
      role: 'reviewer',
      teamName: 'Tidewater Cold Storage',
      expiresAt: created.body.invitation.expiresAt,
    });

    const invitee = request.agent(t.app);
    const accepted = await invitee.post(`/api/invitations/${token}/accept`).send({ name: 'Lena Park', password: NEW_PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({ email: 'lena.park@tidewater.example', name: 'Lena Park', role: 'reviewer' });
    const me = await invitee.get('/api/auth/me').expect(200);
    expect(me.body.user).toEqual(accepted.body.user);

    await request(t.app).post('/api/auth/sign-in').send({ email: 'lena.park@tidewater.example', password: NEW_PASSWORD }).expect(200);
    const team = await admin.get('/api/team').expect(200);
    expect(team.body.members.map((m: { email: string }) => m.email)).toContain('lena.park@tidewater.example');
    expect(team.body.invitations).toEqual([]);
  });

  it('refuses a used link: preview and accept answer 404', async () => {
    const admin = await signInAs(t.app, 'admin');
    const token = await inviteAndReadToken(admin, 'once@tidewater.example');
    await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Once', password: NEW_PASSWORD }).expect(201);
    const again = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Twice', password: NEW_PASSWORD });
    expect(again.status).toBe(404);
    expect(again.body.error).toBe(INVITATION_GONE);
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    expect(await t.models.User.count({ where: { email: 'once@tidewater.example' } })).toBe(1);
  });

  it('refuses an expired link', async () => {
    const admin = await signInAs(t.app, 'admin');
    const token = await inviteAndReadToken(admin, 'late@tidewater.example');
    await t.models.Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Late', password: NEW_PASSWORD }).expect(404);
  });

  it('refuses an unknown but well-formed token with 404, a malformed one with 400', async () => {
    await request(t.app).get(`/api/invitations/${'A'.repeat(43)}`).expect(404);
    const bad = await request(t.app).get('/api/invitations/short');
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([{ path: 'params.token', message: expect.any(String) }]);
  });

  it('revokes a pending invitation: 204, then its link is dead and it leaves the list', async () => {
    const admin = await signInAs(t.app, 'admin');
    const token = await inviteAndReadToken(admin, 'withdrawn@tidewater.example');
    const [pending] = (await admin.get('/api/team').expect(200)).body.invitations;
    await admin.delete(`/api/team/invitations/${pending.id}`).expect(204);
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    expect((await admin.get('/api/team').expect(200)).body.invitations).toEqual([]);
    await admin.delete(`/api/team/invitations/${pending.id}`).expect(404);
  });

  it('a new invitation to the same address replaces the pending one: only the newest link works', async () => {
    const admin = await signInAs(t.app, 'admin');
    const first = await inviteAndReadToken(admin, 'again@tidewater.example', 'designer');
    const second = await inviteAndReadToken(admin, 'again@tidewater.example', 'installer');
    expect(second).not.toBe(first);
    await request(t.app).get(`/api/invitations/${first}`).expect(404);
    expect((await request(t.app).get(`/api/invitations/${second}`).expect(200)).body.invitation.role).toBe('installer');
    expect((await admin.get('/api/team').expect(200)).body.invitations).toHaveLength(1);
  });

  it('refuses inviting an address that already has an account: 409, in this team or another', async () => {
    const admin = await signInAs(t.app, 'admin');
    const member = await admin.post('/api/team/invitations').send({ email: DEMO.designer.toUpperCase(), role: 'reviewer' });
    expect(member.status).toBe(409);
    expect(member.body.error).toMatch(/already a member of this team/);
    const elsewhere = await admin.post('/api/team/invitations').send({ email: DEMO.otherTeam, role: 'reviewer' });
    expect(elsewhere.status).toBe(409);
    expect((await admin.get('/api/dev/mail').expect(200)).body.messages).toEqual([]);
  });

  it('does not let another team’s admin revoke the invitation (404)', async () => {
    const admin = await signInAs(t.app, 'admin');
    await admin.post('/api/team/invitations').send({ email: 'p@tidewater.example', role: 'designer' }).expect(201);
    const [pending] = (await admin.get('/api/team').expect(200)).body.invitations;
    const sam = await t.models.User.findOne({ where: { email: DEMO.otherTeam } });
    await sam!.update({ role: 'admin' });
    const samAgent = await signInAs(t.app, 'otherTeam');
    await samAgent.delete(`/api/team/invitations/${pending.id}`).expect(404);
  });

  it('answers 400 with field paths when the new member’s name or password is not acceptable', async () => {
    const admin = await signInAs(t.app, 'admin');
    const token = await inviteAndReadToken(admin, 'short@tidewater.example');
    const res = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: '  ', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['name', 'password']);
    await request(t.app).get(`/api/invitations/${token}`).expect(200);
  });
});

describe('the dev mailbox', () => {
  it('shows each admin only the mail sent for their own team, newest first', async () => {
    const maya = await signInAs(t.app, 'admin');
    await maya.post('/api/team/invitations').send({ email: 'first@tidewater.example', role: 'designer' }).expect(201);
    await maya.post('/api/team/invitations').send({ email: 'second@tidewater.example', role: 'designer' }).expect(201);
    const sam = await t.models.User.findOne({ where: { email: DEMO.otherTeam } });
    await sam!.update({ role: 'admin' });
    const samAgent = await signInAs(t.app, 'otherTeam');
    expect((await samAgent.get('/api/dev/mail').expect(200)).body.messages).toEqual([]);
    const mine = (await maya.get('/api/dev/mail').expect(200)).body.messages;
    expect(mine.map((m: { to: string[] }) => m.to[0])).toEqual(['second@tidewater.example', 'first@tidewater.example']);
  });

  it('does not exist (404) when mail goes to a real relay', async () => {
    const relay = await makeTestApp({ env: { MAIL: 'smtp://127.0.0.1:9' } });
    try {
      const admin = await signInAs(relay.app, 'admin');
      await admin.get('/api/dev/mail').expect(404);
    } finally {
      await relay.close();
    }
  });

  it('answers 502 and creates nothing when the relay refuses the invitation mail', async () => {
    // Port 9 (discard) on loopback has no listener here, so the SMTP connection is refused.
    const relay = await makeTestApp({ env: { MAIL: 'smtp://127.0.0.1:9' } });
    const spy = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const admin = await signInAs(relay.app, 'admin');
      const res = await admin.post('/api/team/invitations').send({ email: 'nomail@tidewater.example', role: 'designer' });
      // RFC 9110 §15.6.3: 502 when an upstream server fails.
      expect(res.status).toBe(502);
      expect(res.body.error).toMatch(/could not be sent/);
      expect(await relay.models.Invitation.count()).toBe(0);
    } finally {
      spy.mockRestore();
      await relay.close();
    }
  });
});
