import { randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { INVITATION_GONE, INVITATIONS_PER_HOUR, SENDER_NOT_ADMIN } from '@/server/services/invitations';
import { APP_ORIGIN, DEMO, makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';

/**
 * The invitation routes under attack: floods of made-up links cost no password hash and are cut off
 * per address; a team cannot mail out invitations without end; an invitation dies with its sender's
 * admin role; passwords longer than bcrypt reads are refused; the conflict message keeps other
 * teams out of it.
 */
let t: TestApp;
let maya: Agent;
beforeEach(async () => {
  t = await makeTestApp({ seed: 'people' });
  maya = await signInAs(t.app, 'admin');
});
afterEach(() => {
  jest.restoreAllMocks();
  return t.close();
});

const NEW_PASSWORD = 'cold-aisle-42-spare';
const madeUpToken = () => randomBytes(32).toString('base64url');
const accept = (token: string, password = NEW_PASSWORD, address = '198.51.100.20') =>
  request(t.app).post(`/api/invitations/${token}/accept`).set('X-Forwarded-For', address).send({ name: 'Lena Park', password });

async function invite(admin: Agent, email: string, role = 'designer'): Promise<string> {
  await admin.post('/api/team/invitations').send({ email, role }).expect(201);
  const mail = await maya.get('/api/dev/mail').expect(200);
  const message = mail.body.messages.find((m: { to: string[] }) => m.to.includes(email));
  const match = new RegExp(`${APP_ORIGIN}/invitations/([A-Za-z0-9_-]{43})`).exec(message?.text ?? '');
  if (!match) throw new Error(`no invitation link in the mail to ${email}`);
  return match[1];
}

describe('a flood of made-up invitation links', () => {
  it('looks each token up before hashing anything: 404s and not one password hash', async () => {
    const hash = jest.spyOn(bcrypt, 'hash');
    const answers = await Promise.all(Array.from({ length: 20 }, (_, i) => accept(madeUpToken(), NEW_PASSWORD, `203.0.113.${i + 1}`)));
    expect(answers.map((res) => res.status)).toEqual(Array(20).fill(404));
    expect(answers[0].body.error).toBe(INVITATION_GONE);
    expect(hash).not.toHaveBeenCalled();
  });

  it('is cut off per address with 429 and a sentence after 30 requests in ten minutes', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 32; i++) statuses.push((await accept(madeUpToken())).status);
    expect(statuses.slice(0, 30)).toEqual(Array(30).fill(404));
    // RFC 6585 §4: 429 Too Many Requests.
    expect(statuses.slice(30)).toEqual([429, 429]);
    const limited = await request(t.app).get(`/api/invitations/${madeUpToken()}`).set('X-Forwarded-For', '198.51.100.20');
    expect(limited.status).toBe(429);
    expect(limited.body.error).toMatch(/^Too many requests for invitation links from your address\. Wait \d+ minutes? and try again\.$/);
    // Another address is not affected.
    expect((await accept(madeUpToken(), NEW_PASSWORD, '198.51.100.21')).status).toBe(404);
  });
});

describe('invitations per team', () => {
  it(`sends at most ${INVITATIONS_PER_HOUR} in an hour, then answers 429 with a sentence and sends nothing`, async () => {
    for (let i = 0; i < INVITATIONS_PER_HOUR; i++) {
      await maya.post('/api/team/invitations').send({ email: `new-${i}@tidewater.example`, role: 'installer' }).expect(201);
    }
    const res = await maya.post('/api/team/invitations').send({ email: 'one-too-many@tidewater.example', role: 'installer' });
    expect(res.status).toBe(429);
    expect(res.body.error).toMatch(new RegExp(`^Your team has sent ${INVITATIONS_PER_HOUR} invitations in the last hour\\. Wait \\d+ minutes? before sending another\\.$`));
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect((await maya.get('/api/dev/mail').expect(200)).body.messages).toHaveLength(INVITATIONS_PER_HOUR);
  });

  it('counts each team on its own', async () => {
    for (let i = 0; i < INVITATIONS_PER_HOUR; i++) {
      await maya.post('/api/team/invitations').send({ email: `new-${i}@tidewater.example`, role: 'installer' }).expect(201);
    }
    const sam = await t.models.User.findOne({ where: { email: DEMO.otherTeam } });
    await sam!.update({ role: 'admin' });
    const quayside = await signInAs(t.app, 'otherTeam');
    await quayside.post('/api/team/invitations').send({ email: 'lab@quayside.example', role: 'designer' }).expect(201);
  });
});

describe('an invitation lives as long as its sender is an admin', () => {
  it('stops working when the sender is demoted, with a sentence that says why', async () => {
    const theo = await t.models.User.findOne({ where: { email: DEMO.reviewer } });
    await maya.patch(`/api/team/members/${theo!.id}`).send({ role: 'admin' }).expect(200);
    const theoAgent = await signInAs(t.app, 'reviewer');
    const token = await invite(theoAgent, 'would-be-admin@tidewater.example', 'admin');
    await maya.patch(`/api/team/members/${theo!.id}`).send({ role: 'reviewer' }).expect(200);

    const preview = await request(t.app).get(`/api/invitations/${token}`);
    expect(preview.status).toBe(404);
    expect(preview.body.error).toBe(SENDER_NOT_ADMIN);
    const res = await accept(token);
    expect(res.status).toBe(404);
    expect(res.body.error).toBe(SENDER_NOT_ADMIN);
    expect(await t.models.User.count({ where: { email: 'would-be-admin@tidewater.example' } })).toBe(0);
    expect((await maya.get('/api/team').expect(200)).body.invitations).toEqual([]);
    // Made admin again, the sender does not bring the old invitation back.
    await maya.patch(`/api/team/members/${theo!.id}`).send({ role: 'admin' }).expect(200);
    expect((await accept(token)).status).toBe(404);
  });

  it('keeps working while the sender stays an admin', async () => {
    const token = await invite(maya, 'lena.park@tidewater.example', 'reviewer');
    expect((await accept(token)).status).toBe(201);
  });
});

describe('passwords longer than bcrypt reads', () => {
  it('refuses 73 bytes at sign-up with a sentence, and accepts 72', async () => {
    const token = await invite(maya, 'lena.park@tidewater.example');
    // bcrypt uses only the first 72 bytes of a password (Provos & Mazières 1999; bcryptjs alike).
    const tooLong = 'a'.repeat(73);
    const refused = await accept(token, tooLong);
    expect(refused.status).toBe(400);
    expect(refused.body.issues).toEqual([{ path: 'password', message: expect.stringMatching(/^Use at most 72 bytes/) }]);
    // Counted in bytes of UTF-8 (RFC 3629): 36 × "é" is 36 characters but 72 bytes; 37 are 74.
    expect((await accept(token, 'é'.repeat(37))).status).toBe(400);
    const accepted = await accept(token, 'é'.repeat(36));
    expect(accepted.status).toBe(201);
    await request(t.app).post('/api/auth/sign-in').send({ email: 'lena.park@tidewater.example', password: 'é'.repeat(36) }).expect(200);
  });
});

describe('the conflict message', () => {
  it('says an address has an account without a word about other teams', async () => {
    const res = await maya.post('/api/team/invitations').send({ email: DEMO.otherTeam, role: 'designer' });
    expect(res.status).toBe(409);
    expect(res.body.error).toBe(`${DEMO.otherTeam} already has a Cablewright account, so it cannot be invited. Ask them for another address.`);
    expect(res.body.error.replace(DEMO.otherTeam, '')).not.toMatch(/team|Quayside/i);
  });
});
