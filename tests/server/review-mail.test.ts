import { DEMO, makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, mailbox, saveAndSubmit, signInQuaysideAdmin } from './helpers/designs';

/** The review e-mails, read back from the local SMTP sink through GET /api/dev/mail as the team's admin. */
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

const APP = 'http://localhost:8090'; // TEST_ENV's APP_URL
const review = (agent: Agent, n: number, body: Record<string, unknown>) => agent.post(`/api/designs/${id}/versions/${n}/review`).send(body).expect(200);
const recipients = async () => (await mailbox(maya)).map((m) => m.to.join(',')).sort();

describe('e-mails of the review steps', () => {
  it('tells the team’s reviewers of a submission, with the failure report link and the summary', async () => {
    const n = await saveAndSubmit(ravi, id, harborV1());
    const mail = await mailbox(maya);
    expect(mail.map((m) => m.to)).toEqual([[DEMO.reviewer]]);
    expect(mail[0].subject).toBe(`Please review Harbor Road storage, version ${n}`);
    expect(mail[0].text).toContain(`Ravi Menon has submitted version ${n} of "Harbor Road storage" (Harbor Road server room) for review.`);
    expect(mail[0].text).toContain(`${APP}/designs/${id}/versions/${n}/report`);
    // harbor-road v1's analysis: cam-rec-2 not redundant (docs/demo.md's deliberate flaws).
    expect(mail[0].text).toContain('5 of 6 hosts redundant, 2 errors, 2 warnings, 3 single points of failure');
    expect(mail[0].html).toContain(`href="${APP}/designs/${id}/versions/${n}/report"`);
  });

  it('tells the author when changes are asked, with the comment and the version link', async () => {
    const n = await saveAndSubmit(ravi, id);
    await review(theo, n, { action: 'request-changes', comment: 'Label HR-B-10 at both ends.' });
    const [latest] = await mailbox(maya);
    expect(latest.to).toEqual([DEMO.designer]);
    expect(latest.subject).toBe(`Changes asked on Harbor Road storage, version ${n}`);
    expect(latest.text).toContain('Label HR-B-10 at both ends.');
    expect(latest.text).toContain(`${APP}/designs/${id}/versions/${n}`);
    expect(latest.text).not.toContain('/report');
    expect(await recipients()).toEqual([DEMO.designer, DEMO.reviewer]);
  });

  it('tells the author and the installers of an approval, and nobody else', async () => {
    const n = await saveAndSubmit(ravi, id);
    await review(theo, n, { action: 'approve' });
    const approvals = (await mailbox(maya)).filter((m) => m.subject.startsWith('Approved:'));
    expect(approvals.map((m) => m.to[0]).sort()).toEqual([DEMO.installer, DEMO.designer].sort());
    for (const m of approvals) {
      expect(m.subject).toBe(`Approved: Harbor Road storage, version ${n}`);
      expect(m.text).toContain(`${APP}/designs/${id}/versions/${n}`);
    }
  });

  it('says in the approval e-mail that errors were overridden, and why', async () => {
    const n = await saveAndSubmit(ravi, id, harborV1());
    await review(theo, n, { action: 'approve', comment: 'Pilot only; the missing cable is pulled on Monday.' });
    const [approval] = (await mailbox(maya)).filter((m) => m.subject.startsWith('Approved:'));
    expect(approval.text).toContain('approved it although the analysis reported 2 errors, with this reason: Pilot only; the missing cable is pulled on Monday.');
  });

  it('asks the admins when the team has no reviewer, and never a removed member', async () => {
    const theoId = (await t.models.User.findOne({ where: { email: DEMO.reviewer } }))?.id;
    await maya.delete(`/api/team/members/${theoId}`).expect(204);
    await saveAndSubmit(ravi, id);
    expect((await mailbox(maya)).map((m) => m.to)).toEqual([[DEMO.admin]]);
  });

  it('keeps the mail in the team: another team’s admin sees none of it', async () => {
    await saveAndSubmit(ravi, id);
    const quinn = await signInQuaysideAdmin(t);
    expect(await mailbox(quinn)).toEqual([]);
    expect(await mailbox(maya)).toHaveLength(1);
  });

  it('records the step even when the mail relay fails, and logs the failure', async () => {
    const send = t.mailer.sendMail;
    t.mailer.sendMail = () => Promise.reject(new Error('relay refused'));
    const log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const n = await saveAndSubmit(ravi, id);
      const version = (await ravi.get(`/api/designs/${id}/versions/${n}`).expect(200)).body.version;
      expect(version.review.state).toBe('in-review');
      expect(log.mock.calls.map((c) => c[0])).toContain(`Review e-mail to ${DEMO.reviewer} could not be sent:`);
    } finally {
      t.mailer.sendMail = send;
      log.mockRestore();
    }
  });
});
