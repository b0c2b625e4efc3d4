import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { Mailbox, type CaughtMessage } from './mailbox';

export const TEAM_HEADER = 'X-Cablewright-Team';
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

export type MailSink = { host: string; port: number; mailbox: Mailbox; close: () => Promise<void> };

/**
 * A local SMTP server that accepts every message on a free loopback port and keeps it in memory
 * (MAIL=fake). Mail goes through real SMTP, so what the dev mailbox shows is what a relay would get.
 */
export async function startMailSink(capacity = 200): Promise<MailSink> {
  const mailbox = new Mailbox(capacity);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    banner: 'Cablewright local mail sink',
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          mailbox.add(toCaught(parsed));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  const host = '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, host, () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return { host, port, mailbox, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

function toCaught(parsed: ParsedMail): CaughtMessage {
  const team = Number(parsed.headers.get(TEAM_HEADER.toLowerCase()));
  return {
    id: parsed.messageId ?? `${Date.now()}-${Math.random().toString(36).slice(2)}`,
    from: parsed.from?.text ?? '',
    to: addresses(parsed.to),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    html: typeof parsed.html === 'string' ? parsed.html : null,
    date: (parsed.date ?? new Date()).toISOString(),
    teamId: Number.isInteger(team) && team > 0 ? team : null,
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((group) => group.value.map((a) => a.address ?? '')).filter(Boolean);
}
