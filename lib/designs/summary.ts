import type { DesignStatus } from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';

/** Our words for the review states (docs/demo.md: draft / in review / approved / changes asked). */
export const STATUS_LABELS: Record<DesignStatus, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  approved: 'Approved',
  'changes-requested': 'Changes asked',
};

export type StatusTone = 'neutral' | 'info' | 'success' | 'warning';

export const STATUS_TONES: Record<DesignStatus, StatusTone> = {
  draft: 'neutral',
  'in-review': 'info',
  approved: 'success',
  'changes-requested': 'warning',
};

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** "6 of 6 hosts redundant": how many storage hosts have no single point of failure. */
export function hostsLine(summary: ReportSummary): string {
  if (summary.hosts === 0) return 'No storage hosts yet';
  return `${summary.redundantHosts} of ${plural(summary.hosts, 'host')} redundant`;
}

/**
 * The stored summary as short phrases, worst news included even when zero for errors (a reviewer
 * looks for "no errors" as much as for a count); warnings and single points only when present.
 */
export function summaryPhrases(summary: ReportSummary): string[] {
  const phrases = [hostsLine(summary), summary.errors === 0 ? 'no errors' : plural(summary.errors, 'error')];
  if (summary.singlePointsOfFailure > 0) phrases.push(plural(summary.singlePointsOfFailure, 'single point of failure', 'single points of failure'));
  if (summary.warnings > 0) phrases.push(plural(summary.warnings, 'warning'));
  return phrases;
}

export function summaryText(summary: ReportSummary): string {
  return summaryPhrases(summary).join(' · ');
}

/** How serious a summary is, for the tint next to its words (the words say it all on their own). */
export function summaryTone(summary: ReportSummary): 'success' | 'warning' | 'danger' {
  if (summary.errors > 0 || summary.singlePointsOfFailure > 0) return 'danger';
  if (summary.warnings > 0 || summary.redundantHosts < summary.hosts) return 'warning';
  return 'success';
}

/** A design's state in lower case, after a "·" ("draft v4", "in review v4"). */
const STATE_WORDS: Record<DesignStatus, string> = { draft: 'draft', 'in-review': 'in review', approved: 'approved', 'changes-requested': 'changes asked' };

export type StatusPart = { label: string; tone: StatusTone };

/**
 * What a design's status says, so a newer draft never hides behind an older approval: the approved
 * version and, when a newer one follows it, that one with its own state ("Approved v3 · draft v4").
 * Without an approval, the newest version's state ("In review v2"); without versions, "Draft".
 */
export function statusParts(design: {
  status: DesignStatus;
  approvedVersion: { number: number } | null;
  latest: { number: number; review: DesignStatus } | null;
}): StatusPart[] {
  const { approvedVersion: approved, latest } = design;
  if (approved) {
    const parts: StatusPart[] = [{ label: `Approved v${approved.number}`, tone: 'success' }];
    if (latest && latest.number > approved.number) parts.push({ label: `${STATE_WORDS[latest.review]} v${latest.number}`, tone: STATUS_TONES[latest.review] });
    return parts;
  }
  if (!latest) return [{ label: STATUS_LABELS[design.status], tone: STATUS_TONES[design.status] }];
  return [{ label: `${STATUS_LABELS[latest.review]} v${latest.number}`, tone: STATUS_TONES[latest.review] }];
}

export function statusText(parts: readonly StatusPart[]): string {
  return parts.map((p) => p.label).join(' · ');
}
