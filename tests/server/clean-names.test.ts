import request from 'supertest';
import { APP_ORIGIN, makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveAndSubmit } from './helpers/designs';

/**
 * Names and texts people type are shown to others: control characters and the bidirectional
 * formatting characters (Unicode Standard Annex #9, Bidi_Control) are taken out before they are
 * stored, so a name cannot show the text after it reversed (CVE-2021-42574, "Trojan Source").
 */
const RLO = '\u202e'; // RIGHT-TO-LEFT OVERRIDE (UAX #9)
const PDF = '\u202c'; // POP DIRECTIONAL FORMATTING (UAX #9)
const LRI = '\u2066'; // LEFT-TO-RIGHT ISOLATE (UAX #9)
const BEL = '\u0007'; // a C0 control character (Unicode general category Cc)

let t: TestApp;
let ravi: Agent;
beforeEach(async () => {
  t = await makeTestApp();
  ravi = await signInAs(t.app, 'designer');
});
afterEach(() => t.close());

describe('names and texts with hidden characters', () => {
  it('cleans a new member’s name when an invitation is accepted', async () => {
    const maya = await signInAs(t.app, 'admin');
    await maya.post('/api/team/invitations').send({ email: 'lena.park@tidewater.example', role: 'reviewer' }).expect(201);
    const mail = (await maya.get('/api/dev/mail').expect(200)).body.messages[0];
    const token = new RegExp(`${APP_ORIGIN}/invitations/([A-Za-z0-9_-]{43})`).exec(mail.text)![1];
    const res = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: `Lena ${RLO}kraP${PDF}${BEL}`, password: 'cold-aisle-42-spare' });
    expect(res.status).toBe(201);
    expect(res.body.user.name).toBe('Lena kraP');
    expect((await t.models.User.findOne({ where: { email: 'lena.park@tidewater.example' } }))!.name).toBe('Lena kraP');
  });

  it('refuses a name that is nothing but hidden characters, as a blank one', async () => {
    const res = await ravi.post('/api/designs').send({ name: `${RLO}${LRI}${BEL}` });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ path: 'name', message: 'Give the design a name' }]);
  });

  it('cleans design names, sites, version messages and review comments (comments keep their line breaks)', async () => {
    const created = await ravi.post('/api/designs').send({ name: `Cold room${RLO} 2`, site: `Dock${BEL} 4`, document: harborV2(), message: `First${LRI} layout` });
    expect(created.status).toBe(201);
    expect(created.body.design).toMatchObject({ name: 'Cold room 2', site: 'Dock 4' });
    expect(created.body.version.message).toBe('First layout');

    const id = await designId(t);
    const n = await saveAndSubmit(ravi, id);
    const theo = await signInAs(t.app, 'reviewer');
    const reviewed = await theo.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'request-changes', comment: `Line one${RLO} reversed\r\nLine two${BEL}` });
    expect(reviewed.status).toBe(200);
    expect(reviewed.body.review.events[1].comment).toBe('Line one reversed\nLine two');

    const restored = await ravi.post(`/api/designs/${id}/versions/1/restore`).send({ message: `Back${PDF} to version 1` }).expect(201);
    expect(restored.body.version.message).toBe('Back to version 1');
  });
});
