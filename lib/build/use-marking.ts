import { buildQueue } from '@/lib/api/build';
import { useMe } from '@/lib/api/auth';
import { QueueInputError, type BuildQueue, type MarkFields, type QueuedItem, type StepFields } from '@/lib/build/queue';
import type { ShownRecord } from '@/lib/build/pending';
import { can } from '@/shared/roles';

export type Marking = {
  /** Whether this account may mark this version now; when not, `why` says so in a sentence. */
  canMark: boolean;
  why: string | null;
  /** Queue a mark; answers the sentence to show when the fields would be refused (a problem without a note). */
  markCable: (fields: MarkFields) => string | null;
  markStep: (fields: StepFields) => string | null;
  /** Take a queued mark back before it was sent. */
  discard: (item: Pick<QueuedItem, 'clientId'>) => boolean;
};

function attempt(run: () => void): string | null {
  try {
    run();
    return null;
  } catch (error) {
    if (error instanceof QueueInputError) return error.issues.map((i) => i.message).join(' ');
    throw error;
  }
}

/**
 * Marking one version from a screen: who may (installers and admins, approved versions still open
 * to marks — shared/roles.ts, docs/api.md), and every mark through the phone's queue, so a mark made
 * without signal is kept and sent later.
 */
export function useMarking(designId: number, version: number, record: ShownRecord | undefined, queue: BuildQueue = buildQueue): Marking {
  const me = useMe().data;
  const allowed = me ? can(me.role, 'markBuild') : false;
  const open = record?.accepting ?? false;
  const why = !me ? null : !allowed ? 'Installers and admins mark the build; you can follow its progress here.' : record && !open ? 'This version is not approved, so it takes no marks.' : null;
  const canMark = Boolean(me && allowed && open);
  const target = me ? { designId, version, userId: me.id } : null;
  return {
    canMark,
    why,
    markCable: (fields) => (target && canMark ? attempt(() => queue.getState().enqueueMark(target, fields)) : why),
    markStep: (fields) => (target && canMark ? attempt(() => queue.getState().enqueueStep(target, fields)) : why),
    discard: (item) => queue.getState().discard(item.clientId),
  };
}
