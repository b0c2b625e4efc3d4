import { createMailer, type Mailer } from '@/server/mail/mailer';
import { Mailbox } from '@/server/mail/mailbox';
import { escapeHtml, invitationEmail } from '@/server/mail/invitation-email';

const message = (n: number, teamId: number | null = 1) => ({
  id: `m${n}`,
  from: 'a@b.example',
  to: ['c@d.example'],
  subject: `s${n}`,
  text: 't',
  html: null,
  date: new Date(0).toISOString(),
  teamId,
});

describe('the dev mailbox', () => {
  it('keeps only the newest messages up to its capacity, newest first', () => {
    const box = new Mailbox(3);
    for (let n = 1; n <= 5; n++) box.add(message(n));
    expect(box.size).toBe(3);
    expect(box.forTeam(1).map((m) => m.id)).toEqual(['m5', 'm4', 'm3']);
  });

  it('shows a team only its own messages, without the internal team tag', () => {
    const box = new Mailbox();
    box.add(message(1, 1));
    box.add(message(2, 2));
    box.add(message(3, null));
    const { teamId: _team, ...plain } = message(2, 2);
    expect(box.forTeam(2)).toEqual([plain]);
    expect(box.forTeam(5)).toEqual([]);
  });
});

describe('the invitation e-mail', () => {
  const expiresAt = new Date('2031-04-08T09:30:00Z');
  const mail = invitationEmail({
    teamId: 7,
    teamName: 'Tidewater <Cold> Storage',
    to: 'lena@tidewater.example',
    role: 'installer',
    inviterName: 'Maya Okafor',
    link: 'http://localhost:8090/invitations/TOKEN',
    expiresAt,
  });

  it('names the team, the role, the inviter, the link and the expiry in the text', () => {
    expect(mail.to).toBe('lena@tidewater.example');
    expect(mail.subject).toBe('Join Tidewater <Cold> Storage on Cablewright');
    expect(mail.text).toContain('Maya Okafor has invited you');
    expect(mail.text).toContain('as an Installer');
    expect(mail.text).toContain('http://localhost:8090/invitations/TOKEN');
    // 2031-04-08T09:30:00Z read as a US-English long date and a 12-hour time in UTC.
    expect(mail.text).toMatch(/until April 8, 2031(,| at) 9:30\sAM UTC\./);
  });

  it('escapes what it puts into the HTML twin', () => {
    expect(mail.html).toContain('Tidewater &#60;Cold&#62; Storage');
    expect(mail.html).not.toContain('<Cold>');
    expect(mail.html).toContain('href="http://localhost:8090/invitations/TOKEN"');
    expect(escapeHtml(`"'&`)).toBe('&#34;&#39;&#38;');
  });
});

describe('the fake mail sink', () => {
  let mailer: Mailer;
  beforeEach(async () => {
    mailer = await createMailer({ mail: { kind: 'fake' }, mailFrom: 'Cablewright <no-reply@cablewright.example>' });
  });
  afterEach(() => mailer.close());

  it('receives a message over real SMTP and parses it into the mailbox before sendMail resolves', async () => {
    expect(mailer.description).toMatch(/^fake SMTP sink on 127\.0\.0\.1:\d+$/);
    await mailer.sendMail({ teamId: 3, to: 'ravi@tidewater.example', subject: 'Hello – ünïcode', text: 'plain body', html: '<p>html body</p>' });
    const [got] = mailer.mailbox!.forTeam(3);
    expect(got).toMatchObject({
      from: '"Cablewright" <no-reply@cablewright.example>',
      to: ['ravi@tidewater.example'],
      subject: 'Hello – ünïcode',
      text: 'plain body',
      html: '<p>html body</p>',
    });
    expect(Date.parse(got.date)).not.toBeNaN();
  });
});
