import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '@/server/config';
import type { Mailbox } from './mailbox';
import { startMailSink, TEAM_HEADER } from './sink';

/** One e-mail the product sends; `teamId` is the team it is sent for (the dev mailbox shows it to that team only). */
export type OutgoingMail = { teamId: number; to: string; subject: string; text: string; html?: string };

export interface Mailer {
  sendMail(mail: OutgoingMail): Promise<void>;
  /** The fake sink's mailbox when MAIL=fake, else null (and /api/dev/mail answers 404). */
  readonly mailbox: Mailbox | null;
  /** For the start-up banner: where mail goes. */
  readonly description: string;
  close(): Promise<void>;
}

/** Build the mailer for `config.mail`: a local SMTP sink (started here) when fake, or the given relay. */
export async function createMailer(config: Pick<Config, 'mail' | 'mailFrom'>): Promise<Mailer> {
  if (config.mail.kind === 'fake') {
    const sink = await startMailSink();
    // The sink offers no TLS; ignoreTLS keeps nodemailer from trying STARTTLS on loopback.
    const transport = nodemailer.createTransport({ host: sink.host, port: sink.port, secure: false, ignoreTLS: true });
    return build(transport, config.mailFrom, sink.mailbox, `fake SMTP sink on ${sink.host}:${sink.port}`, sink.close);
  }
  const transport = nodemailer.createTransport(config.mail.url);
  return build(transport, config.mailFrom, null, `SMTP relay ${redact(config.mail.url)}`, async () => undefined);
}

function build(
  transport: Transporter,
  from: string,
  mailbox: Mailbox | null,
  description: string,
  closeSink: () => Promise<void>,
): Mailer {
  return {
    mailbox,
    description,
    async sendMail(mail) {
      await transport.sendMail({
        from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: { [TEAM_HEADER]: String(mail.teamId) },
      });
    },
    async close() {
      transport.close();
      await closeSink();
    },
  };
}

/** Never print a relay password in the start-up banner. */
function redact(url: string): string {
  try {
    const parsed = new URL(url);
    if (parsed.password) parsed.password = '***';
    return parsed.toString();
  } catch {
    return 'smtp://…';
  }
}
