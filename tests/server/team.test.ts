import request from 'supertest';
import { DEMO, makeTestApp, signInAs, type DemoWho, type TestApp } from './helpers/app';

let t: TestApp;
beforeEach(async () => {
  t = await makeTestApp({ seed: 'people' });
});
afterEach(() => t.close());

async function idOf(email: string): Promise<number> {
  const user = await t.models.User.findOne({ where: { email } });
  if (!user) throw new Error(`no demo user ${email}`);
  return user.id;
}

describe('GET /api/team', () => {
  it.each<DemoWho>(['admin', 'designer', 'reviewer', 'installer'])('shows the Tidewater members to the %s', async (who) => {
    const agent = await signInAs(t.app, who);
    const res = await agent.get('/api/team').expect(200);
    expect(res.body.team.name).toBe('Tidewater Cold Storage');
    expect(res.body.members.map((m: { email: string }) => m.email).sort()).toEqual(
      [DEMO.admin, DEMO.designer, DEMO.installer, DEMO.reviewer].sort(),
    );
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|tokenHash/);
  });

  it('includes pending invitations for admins only', async () => {
    const admin = await signInAs(t.app, 'admin');
    await admin.post('/api/team/invitations').send({ email: 'new.person@tidewater.example', role: 'designer' }).expect(201);
    const forAdmin = await admin.get('/api/team').expect(200);
    expect(forAdmin.body.invitations).toEqual([
      expect.objectContaining({ email: 'new.person@tidewater.example', role: 'designer', invitedBy: { id: await idOf(DEMO.admin), name: 'Maya Okafor' } }),
    ]);
    const designer = await signInAs(t.app, 'designer');
    expect((await designer.get('/api/team').expect(200)).body).not.toHaveProperty('invitations');
  });

  it('shows the other team only its own member', async () => {
    const sam = await signInAs(t.app, 'otherTeam');
    const res = await sam.get('/api/team').expect(200);
    expect(res.body.team.name).toBe('Quayside Analytics');
    expect(res.body.members.map((m: { email: string }) => m.email)).toEqual([DEMO.otherTeam]);
  });

  it('answers 401 when signed out', async () => {
    await request(t.app).get('/api/team').expect(401);
  });
});

describe('role guard on the team management routes', () => {
  const routes = [
    ['post', '/api/team/invitations', { email: 'x@tidewater.example', role: 'designer' }],
    ['delete', '/api/team/invitations/1', undefined],
    ['patch', '/api/team/members/2', { role: 'reviewer' }],
    ['delete', '/api/team/members/2', undefined],
    ['get', '/api/dev/mail', undefined],
  ] as const;

  it.each(routes)('answers %s %s with 401 when signed out', async (method, path, body) => {
    const res = await request(t.app)[method](path).send(body);
    // RFC 9110 §15.5.2: 401 Unauthorized.
    expect(res.status).toBe(401);
  });

  it.each(routes.flatMap((r) => (['designer', 'reviewer', 'installer', 'otherTeam'] as const).map((who) => [who, ...r] as const)))(
    'answers the %s with 403 on %s %s',
    async (who, method, path, body) => {
      const agent = await signInAs(t.app, who);
      const res = await agent[method](path).send(body);
      // RFC 9110 §15.5.4: 403 Forbidden; docs/api.md: team management is for admins.
      expect(res.status).toBe(403);
      expect(res.body.error).toMatch(/Your role/);
    },
  );
});

describe('changing roles and removing members', () => {
  it('changes a member’s role and answers the member', async () => {
    const admin = await signInAs(t.app, 'admin');
    const id = await idOf(DEMO.reviewer);
    const res = await admin.patch(`/api/team/members/${id}`).send({ role: 'designer' }).expect(200);
    expect(res.body.member).toMatchObject({ id, email: DEMO.reviewer, role: 'designer' });
    expect((await t.models.User.findByPk(id))?.role).toBe('designer');
  });

  it('refuses an admin changing their own role with 409 and a sentence', async () => {
    const admin = await signInAs(t.app, 'admin');
    const res = await admin.patch(`/api/team/members/${await idOf(DEMO.admin)}`).send({ role: 'designer' });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/cannot change your own role/);
  });

  it('lets a second admin change the first admin’s role', async () => {
    const admin = await signInAs(t.app, 'admin');
    await admin.patch(`/api/team/members/${await idOf(DEMO.reviewer)}`).send({ role: 'admin' }).expect(200);
    const theo = await signInAs(t.app, 'reviewer');
    await theo.patch(`/api/team/members/${await idOf(DEMO.admin)}`).send({ role: 'designer' }).expect(200);
  });

  it('removes a member: 204, and the member is gone from the team', async () => {
    const admin = await signInAs(t.app, 'admin');
    await admin.delete(`/api/team/members/${await idOf(DEMO.installer)}`).expect(204);
    const emails = (await admin.get('/api/team').expect(200)).body.members.map((m: { email: string }) => m.email);
    expect(emails).not.toContain(DEMO.installer);
  });

  it('refuses an admin removing themselves with 409', async () => {
    const admin = await signInAs(t.app, 'admin');
    const res = await admin.delete(`/api/team/members/${await idOf(DEMO.admin)}`);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/cannot remove yourself/);
  });

  it('answers 404 for a member of another team, exactly as for an id that does not exist', async () => {
    const admin = await signInAs(t.app, 'admin');
    const sam = await idOf(DEMO.otherTeam);
    const other = await admin.patch(`/api/team/members/${sam}`).send({ role: 'reviewer' });
    const missing = await admin.patch('/api/team/members/99999').send({ role: 'reviewer' });
    expect(other.status).toBe(404);
    expect(other.body).toEqual(missing.body);
    await admin.delete(`/api/team/members/${sam}`).expect(404);
    expect((await t.models.User.findByPk(sam))?.role).toBe('designer');
  });
});
