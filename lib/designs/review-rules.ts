import type { ReviewAction, ReviewEventDto, VersionSummary } from '@/shared/api/designs';
import { can, type Role } from '@/shared/roles';
import { plural } from '@/lib/designs/summary';

/**
 * Which review steps the signed-in person may take on one version, mirroring the server's rules
 * (server/services/designs/reviews.ts) so buttons that would only earn a refusal are not offered,
 * and saying why when a step is withheld for a reason the person may not guess.
 */
export type ReviewOptions = {
  submit: boolean;
  decide: boolean;
  /** Why the step this role normally has is not offered on this version, or null. */
  note: string | null;
  /** Set when approving needs an override comment: the version's error count. */
  overrideErrors: number | null;
};

type Viewer = { id: number; role: Role };

export function reviewOptions(viewer: Viewer, version: VersionSummary, latestNumber: number): ReviewOptions {
  const state = version.review.state;
  const none: ReviewOptions = { submit: false, decide: false, note: null, overrideErrors: null };
  if (can(viewer.role, 'editDesigns') && state === 'draft') {
    if (version.number === latestNumber) return { ...none, submit: true, decide: false };
    return { ...none, note: `Version ${version.number} was followed by version ${latestNumber}; submit the latest version instead.` };
  }
  if (can(viewer.role, 'review') && state === 'in-review') {
    if (version.author.id === viewer.id) {
      return { ...none, note: `You saved version ${version.number} yourself, so someone else on the team reviews it.` };
    }
    return { ...none, decide: true, overrideErrors: version.summary.errors > 0 ? version.summary.errors : null };
  }
  return none;
}

/** The sentence under the comment field when approving needs an override. */
export function overrideSentence(errors: number): string {
  return `The analysis found ${plural(errors, 'error')} in this version. Approving it anyway needs a comment that explains why; the approval is recorded as an override.`;
}

/**
 * The comment a step needs before it is sent (the server checks the same): asking for changes
 * says what to change; approving over errors says why.
 */
export function commentProblem(action: ReviewAction, comment: string, overrideErrors: number | null): string | null {
  if (comment.trim()) return null;
  if (action === 'request-changes') return 'Say what should change, so the designer knows what to fix';
  if (action === 'approve' && overrideErrors) return `Explain why you approve a version with ${plural(overrideErrors, 'error')}`;
  return null;
}

export const ACTION_PHRASES: Record<ReviewAction, string> = {
  submit: 'submitted it for review',
  approve: 'approved it',
  'request-changes': 'asked for changes',
};

export function eventPhrase(event: ReviewEventDto): string {
  if (event.action === 'approve' && event.override) return 'approved it over the analysis errors';
  return ACTION_PHRASES[event.action];
}
