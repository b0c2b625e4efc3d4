import type { Issue } from '@/shared/api/common';
import { cleanDocumentText } from '@/shared/topology/clean-names';
import { crossReferenceIssues } from '@/shared/topology/crossref';
import { readableTopologySchema } from '@/shared/topology/formats';
import { readWithLayout } from '@/shared/topology/layout';
import { describeZodIssues } from '@/shared/topology/messages';
import type { Topology } from '@/shared/topology/schema';
import { sizeIssues } from '@/shared/topology/size-limits';
import { isFormat1 } from '@/shared/topology/upgrade';

/**
 * The gate every uploaded or edited document passes: the size limits first (list lengths only,
 * before anything else reads the document), then zod for shape (the layout by a schema that keeps
 * every device id as a key, see layout.ts), then cross-references. It reads format 1 and format 2
 * and always answers format 2 (`from` says which one came in); a valid document comes back with
 * control and bidirectional-override characters taken out of its names and labels
 * (clean-names.ts). It never throws — the server feeds it whatever a user sends — and it caps the
 * list at MAX_ISSUES so a million bad entries cannot become a million-line answer; the last issue
 * then says how many more there were.
 */
export const MAX_ISSUES = 200;

export type ValidationResult = { ok: true; doc: Topology; from: 1 | 2 } | { ok: false; issues: Issue[] };

function capped(issues: Issue[]): Issue[] {
  if (issues.length <= MAX_ISSUES) return issues;
  const rest = issues.length - (MAX_ISSUES - 1);
  return [
    ...issues.slice(0, MAX_ISSUES - 1),
    { path: '', message: `…and ${rest} more problems; fix these first.` },
  ];
}

export function validateTopology(input: unknown): ValidationResult {
  try {
    const tooLarge = sizeIssues(input);
    if (tooLarge.length > 0) return { ok: false, issues: tooLarge };
    const parsed = readWithLayout(readableTopologySchema, input);
    if (!parsed.success) return { ok: false, issues: capped(describeZodIssues(parsed.error, input)) };
    const issues = crossReferenceIssues(parsed.data);
    if (issues.length > 0) return { ok: false, issues: capped(issues) };
    return { ok: true, doc: cleanDocumentText(parsed.data), from: isFormat1(input) ? 1 : 2 };
  } catch (error) {
    // Only pathological input gets here (a getter that throws, a stack overflow on a cyclic
    // structure); it is still the sender's mistake, never a crash.
    const reason = error instanceof Error ? error.message : 'unknown error';
    return { ok: false, issues: [{ path: '', message: `The document could not be read (${reason}).` }] };
  }
}
