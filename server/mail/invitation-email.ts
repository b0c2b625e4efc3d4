import { ROLE_LABELS, type Role } from '@/shared/roles';
import type { OutgoingMail } from './mailer';

export type InvitationEmailInput = {
  teamId: number;
  teamName: string;
  to: string;
  role: Role;
  inviterName: string | null;
  link: string;
  expiresAt: Date;
};

/** The invitation e-mail: plain text first (many admins read mail that way), and a simple HTML twin. */
export function invitationEmail(input: InvitationEmailInput): OutgoingMail {
  const role = ROLE_LABELS[input.role];
  const who = input.inviterName ? `${input.inviterName} has invited you` : 'You have been invited';
  const expiry = expiryText(input.expiresAt);
  const subject = `Join ${input.teamName} on Cablewright`;
  const text = [
    `${who} to join the team "${input.teamName}" on Cablewright as ${article(role)} ${role}.`,
    '',
    'Cablewright is where the team plans, checks and signs off its iSCSI storage network.',
    '',
    'To accept, open this link, choose your name and a password:',
    input.link,
    '',
    `The link works once and until ${expiry}.`,
    'If you did not expect this invitation, you can ignore this message.',
  ].join('\n');
  const html = [
    '<div style="font-family: sans-serif; line-height: 1.5; color: #1c2b2b">',
    `<p>${escapeHtml(who)} to join the team <strong>${escapeHtml(input.teamName)}</strong> on Cablewright as ${article(role)} <strong>${escapeHtml(role)}</strong>.</p>`,
    '<p>Cablewright is where the team plans, checks and signs off its iSCSI storage network.</p>',
    `<p><a href="${escapeHtml(input.link)}">Accept the invitation</a></p>`,
    `<p style="color: #555">Or paste this link into your browser: ${escapeHtml(input.link)}<br>`,
    `It works once and until ${escapeHtml(expiry)}. If you did not expect this invitation, you can ignore this message.</p>`,
    '</div>',
  ].join('\n');
  return { teamId: input.teamId, to: input.to, subject, text, html };
}

/** As the app writes dates (month name, day, year), with the time in UTC since the reader's zone is unknown. */
export function expiryText(date: Date): string {
  return `${new Intl.DateTimeFormat('en-US', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' }).format(date)} UTC`;
}

function article(word: string): string {
  return /^[aeiou]/i.test(word) ? 'an' : 'a';
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
