import type { ReviewAction } from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';
import { escapeHtml } from './invitation-email';
import type { OutgoingMail } from './mailer';

export type ReviewEmailInput = {
  teamId: number;
  action: ReviewAction;
  designName: string;
  site: string | null;
  number: number;
  actorName: string;
  comment: string | null;
  override: boolean;
  /** The stored analysis summary of the version. */
  summary: ReportSummary;
  /** Where the recipient acts: the failure report for reviewers, the version for everyone else. */
  link: string;
};

/** A paragraph of plain text, or a link shown as its own line. */
type Part = { text: string } | { link: string; label: string };

function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** "5 of 6 hosts redundant, 2 errors, 2 warnings, 3 single points of failure". */
export function summaryLine(s: ReportSummary): string {
  return [
    `${s.redundantHosts} of ${plural(s.hosts, 'host')} redundant`,
    plural(s.errors, 'error'),
    plural(s.warnings, 'warning'),
    plural(s.singlePointsOfFailure, 'single point of failure', 'single points of failure'),
  ].join(', ');
}

function content(input: ReviewEmailInput): { subject: string; parts: Part[] } {
  const design = `"${input.designName}"${input.site ? ` (${input.site})` : ''}`;
  const version = `version ${input.number}`;
  const facts = { text: `The analysis of ${version}: ${summaryLine(input.summary)}.` };
  if (input.action === 'submit') {
    return {
      subject: `Please review ${input.designName}, ${version}`,
      parts: [
        { text: `${input.actorName} has submitted ${version} of ${design} for review.` },
        facts,
        ...(input.comment ? [{ text: `Their note: ${input.comment}` }] : []),
        { link: input.link, label: 'Open the failure report' },
        { text: 'You receive this because you review storage designs for your team in Cablewright.' },
      ],
    };
  }
  if (input.action === 'request-changes') {
    return {
      subject: `Changes asked on ${input.designName}, ${version}`,
      parts: [
        { text: `${input.actorName} has reviewed ${version} of ${design} and asks for changes:` },
        { text: input.comment ?? '' },
        { link: input.link, label: 'Open the version' },
        { text: 'Save a new version with the changes and submit that one for review.' },
      ],
    };
  }
  const why = input.override
    ? [{ text: `${input.actorName} approved it although the analysis reported ${plural(input.summary.errors, 'error')}, with this reason: ${input.comment ?? ''}` }]
    : input.comment
      ? [{ text: `Their comment: ${input.comment}` }]
      : [];
  return {
    subject: `Approved: ${input.designName}, ${version}`,
    parts: [
      { text: `${input.actorName} has approved ${version} of ${design}. It is the version to build from.` },
      facts,
      ...why,
      { link: input.link, label: 'Open the approved version and its cable schedule' },
    ],
  };
}

/** The e-mail for one review step, to one recipient: plain text first, with a simple HTML twin. */
export function reviewEmail(input: ReviewEmailInput, to: string): OutgoingMail {
  const { subject, parts } = content(input);
  const text = parts.map((p) => ('link' in p ? `${p.label}:\n${p.link}` : p.text)).join('\n\n');
  const html = [
    '<div style="font-family: sans-serif; line-height: 1.5; color: #1c2b2b">',
    ...parts.map((p) =>
      'link' in p ? `<p><a href="${escapeHtml(p.link)}">${escapeHtml(p.label)}</a></p>` : `<p>${escapeHtml(p.text)}</p>`,
    ),
    '</div>',
  ].join('\n');
  return { teamId: input.teamId, to, subject, text, html };
}
