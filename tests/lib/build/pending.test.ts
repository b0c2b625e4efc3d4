import type { BuildRecord, CableState, HistoryEntry } from '@/shared/api/build';
import { emptyRecord, ownValue } from '@/shared/keys/record';
import { undoMark, withPending } from '@/lib/build/pending';
import { createBuildQueue } from '@/lib/build/queue';

/** What the phone shows: the server's record with queued marks over it; undoing the last mark. */
function record(): BuildRecord {
  const cables = emptyRecord<BuildRecord['cables'][string]>();
  for (const id of ['c1', 'c2', '__proto__']) cables[id] = { state: 'not-started', note: null, by: null, at: null };
  const steps = emptyRecord<BuildRecord['steps'][string]>();
  steps.s1 = { done: false, note: null, by: null, at: null };
  return {
    designId: 1,
    number: 2,
    accepting: true,
    supersededBy: null,
    cables,
    steps,
    photos: { cables: emptyRecord(), racks: emptyRecord() },
    progress: { cables: { done: 0, total: 3 }, steps: { done: 0, total: 1 }, states: { 'not-started': 3, run: 0, tested: 0, problem: 0 }, racks: [] },
    complete: false,
    completedAt: null,
  };
}
const ME = { id: 4, name: 'Ines Duarte' };

describe('the record with queued marks', () => {
  it('shows the newest queued mark of each cable and step as waiting, and counts it', () => {
    const queue = createBuildQueue();
    const target = { designId: 1, version: 2, userId: 4 };
    queue.getState().enqueueMark(target, { cableId: 'c1', state: 'run' });
    queue.getState().enqueueMark(target, { cableId: 'c1', state: 'tested' });
    queue.getState().enqueueMark(target, { cableId: '__proto__', state: 'tested' });
    queue.getState().enqueueStep(target, { stepId: 's1', done: true, note: 'ok' });
    queue.getState().enqueueMark({ ...target, version: 3 }, { cableId: 'c2', state: 'tested' });
    const shown = withPending(record(), queue.getState().items, ME);
    expect(ownValue(shown.cables, 'c1')).toMatchObject({ state: 'tested', by: ME, pending: 'waiting' });
    expect(ownValue(shown.cables, '__proto__')).toMatchObject({ state: 'tested', pending: 'waiting' });
    expect(ownValue(shown.cables, 'c2')).toMatchObject({ state: 'not-started', pending: null });
    expect(ownValue(shown.steps, 's1')).toMatchObject({ done: true, note: 'ok', pending: 'waiting' });
    expect(shown.progress.cables).toEqual({ done: 2, total: 3 });
    expect(shown.waiting).toBe(4);
    expect(shown.complete).toBe(false);
  });
});

describe('undoing the last mark', () => {
  const mark = (id: number, cableId: string, state: CableState, note: string | null = null): HistoryEntry => ({
    kind: 'cable',
    id,
    cableId,
    state,
    note,
    by: ME,
    at: new Date(2026, 0, 1, 9, id).toISOString(),
    clientId: `id-${id}`,
  });

  it('puts the cable back in the state before its latest mark', () => {
    const history = [mark(1, 'c1', 'run'), mark(2, 'c2', 'run'), mark(3, 'c1', 'problem', 'Bent pin'), mark(4, 'c1', 'tested')];
    expect(undoMark(history, 'c1')).toEqual({ state: 'problem', note: 'Bent pin' });
    expect(undoMark(history, 'c2')).toEqual({ state: 'not-started' });
    expect(undoMark(history, 'c3')).toBeNull();
  });
});
