import { escapeHtml } from './invitation-email';
import type { OutgoingMail } from './mailer';

export type BuildCompleteEmailInput = {
  teamId: number;
  designName: string;
  site: string | null;
  number: number;
  /** Who made the mark that completed the record. */
  finisherName: string;
  cables: number;
  steps: number;
  /** Marks of state `problem` along the way (all later fixed, since every cable ended tested). */
  problems: number;
  link: string;
};

function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** The e-mail that a version's build record is complete: plain text first, with a simple HTML twin. */
export function buildCompleteEmail(input: BuildCompleteEmailInput, to: string): OutgoingMail {
  const design = `"${input.designName}"${input.site ? ` (${input.site})` : ''}`;
  const subject = `Built: ${input.designName}, version ${input.number}`;
  const paragraphs = [
    `The build of version ${input.number} of ${design} is complete: every cable is tested and every bring-up step is done. ${input.finisherName} made the last mark.`,
    `${plural(input.cables, 'cable')} tested, ${plural(input.steps, 'step')} done` +
      (input.problems > 0 ? `; ${plural(input.problems, 'problem was', 'problems were')} noted and resolved along the way (see the history).` : '.'),
    'The build record keeps every mark with who made it and when, for the handover and for later support.',
  ];
  const label = 'Open the version';
  const text = [...paragraphs, `${label}:\n${input.link}`].join('\n\n');
  const html = [
    '<div style="font-family: sans-serif; line-height: 1.5; color: #1c2b2b">',
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(input.link)}">${escapeHtml(label)}</a></p>`,
    '</div>',
  ].join('\n');
  return { teamId: input.teamId, to, subject, text, html };
}
