import { DONE_STATE, type BuildRecord, type CableState, type CableStatus, type Count, type HistoryEntry, type StepStatus } from '@/shared/api/build';
import { emptyRecord, ownValue, type IdRecord } from '@/shared/keys/record';
import type { QueuedItem } from '@/lib/build/queue';

/**
 * What the phone shows: the server's build record with the marks still in the queue laid over it,
 * each flagged as waiting to send (or refused). Queue items apply in order, so the newest queued
 * mark of a cable is its state on screen. Totals are counted again; per-rack progress stays the
 * server's until the marks arrive.
 */
export type PendingFlag = { pending: 'waiting' | 'refused' | null; clientId: string | null };
export type ShownCable = CableStatus & PendingFlag;
export type ShownStep = StepStatus & PendingFlag;
export type ShownRecord = Omit<BuildRecord, 'cables' | 'steps'> & {
  cables: IdRecord<ShownCable>;
  steps: IdRecord<ShownStep>;
  /** Queue items of this version not yet on the server. */
  waiting: number;
};

const flag = (item: QueuedItem): PendingFlag => ({ pending: item.status === 'refused' ? 'refused' : 'waiting', clientId: item.clientId });
const none: PendingFlag = { pending: null, clientId: null };

export function withPending(record: BuildRecord, items: readonly QueuedItem[], me: { id: number; name: string }): ShownRecord {
  const cables = emptyRecord<ShownCable>();
  for (const [id, status] of Object.entries(record.cables)) cables[id] = { ...status, ...none };
  const steps = emptyRecord<ShownStep>();
  for (const [id, status] of Object.entries(record.steps)) steps[id] = { ...status, ...none };
  let waiting = 0;
  for (const item of items) {
    if (item.designId !== record.designId || item.version !== record.number) continue;
    if (item.status !== 'refused') waiting += 1;
    const note = item.fields.note?.trim() || null;
    if (item.kind === 'mark' && ownValue(cables, item.fields.cableId)) {
      cables[item.fields.cableId] = { state: item.fields.state, note, by: me, at: item.queuedAt, ...flag(item) };
    }
    if (item.kind === 'step' && ownValue(steps, item.fields.stepId)) {
      steps[item.fields.stepId] = { done: item.fields.done, note, by: me, at: item.queuedAt, ...flag(item) };
    }
  }
  const cableCount: Count = { done: Object.values(cables).filter((c) => c.state === DONE_STATE).length, total: Object.keys(cables).length };
  const stepCount: Count = { done: Object.values(steps).filter((s) => s.done).length, total: Object.keys(steps).length };
  return {
    ...record,
    cables,
    steps,
    waiting,
    progress: { ...record.progress, cables: cableCount, steps: stepCount },
    complete: cableCount.done === cableCount.total && stepCount.done === stepCount.total,
  };
}

/**
 * "Undo the last mark" of a cable: the marks are never removed, so undoing is a new mark that puts
 * the cable back in the state it had before its latest mark (not started when it had none).
 * Null when the cable has no mark to undo. A mark still in the queue is undone by discarding it.
 */
export function undoMark(history: readonly HistoryEntry[], cableId: string): { state: CableState; note?: string } | null {
  const marks = history.filter((m): m is Extract<HistoryEntry, { kind: 'cable' }> => m.kind === 'cable' && m.cableId === cableId);
  if (marks.length === 0) return null;
  const before = marks[marks.length - 2];
  if (!before) return { state: 'not-started' };
  return before.note ? { state: before.state, note: before.note } : { state: before.state };
}
