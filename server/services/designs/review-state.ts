import type { DesignStatus, ReviewAction, ReviewState } from '@/shared/api/designs';

/** The state a review action leaves a version in. */
export const STATE_AFTER: Record<ReviewAction, ReviewState> = {
  submit: 'in-review',
  approve: 'approved',
  'request-changes': 'changes-requested',
};

/** How a state reads in sentences and e-mails (docs/demo.md's words: draft / in review / approved / changes asked). */
export const STATE_WORDS: Record<ReviewState, string> = {
  draft: 'a draft',
  'in-review': 'in review',
  approved: 'approved',
  'changes-requested': 'sent back with changes asked',
};

type Event = { action: ReviewAction; id: number };

/** A version's state: what its newest review event made it, or draft when it has none. */
export function versionState(events: readonly Event[]): ReviewState {
  let newest: Event | undefined;
  for (const e of events) if (!newest || e.id > newest.id) newest = e;
  return newest ? STATE_AFTER[newest.action] : 'draft';
}

/**
 * A design's status follows its latest reviewed version: the highest-numbered version with any
 * review event. A design whose versions were never submitted is a draft. Saving a new version does
 * not change it: the new version is a draft of its own until someone submits it.
 */
export function designStatus(versions: ReadonlyArray<{ number: number; events: readonly Event[] }>): DesignStatus {
  let reviewed: { number: number; events: readonly Event[] } | undefined;
  for (const v of versions) if (v.events.length > 0 && (!reviewed || v.number > reviewed.number)) reviewed = v;
  return reviewed ? versionState(reviewed.events) : 'draft';
}
