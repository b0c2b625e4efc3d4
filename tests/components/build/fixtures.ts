import type { BuildRecord, HistoryEntry, Photo } from '@/shared/api/build';
import { emptyRecord } from '@/shared/keys/record';

/** A small build record of design 1, version 2: cables c1, c2 and `__proto__` (ids are user text), one step. */
export function buildRecord(change: (record: BuildRecord) => void = () => {}): BuildRecord {
  const cables = emptyRecord<BuildRecord['cables'][string]>();
  for (const id of ['c1', 'c2', '__proto__']) cables[id] = { state: 'not-started', note: null, by: null, at: null };
  const steps = emptyRecord<BuildRecord['steps'][string]>();
  steps.s1 = { done: false, note: null, by: null, at: null };
  const record: BuildRecord = {
    designId: 1,
    number: 2,
    accepting: true,
    supersededBy: null,
    cables,
    steps,
    photos: { cables: emptyRecord<Photo[]>(), racks: emptyRecord<Photo[]>() },
    progress: { cables: { done: 0, total: 3 }, steps: { done: 0, total: 1 }, states: { 'not-started': 3, run: 0, tested: 0, problem: 0 }, racks: [] },
    complete: false,
    completedAt: null,
  };
  change(record);
  return record;
}

export const INES = { id: 4, name: 'Ines Duarte' };
export const MAYA = { id: 1, name: 'Maya Okafor' };

export function cableMark(id: number, cableId: string, state: 'run' | 'tested' | 'problem' | 'not-started', by: { id: number; name: string }, at: string, note: string | null = null): HistoryEntry {
  return { kind: 'cable', id, cableId, state, note, by, at, clientId: `00000000-0000-4000-8000-${String(id).padStart(12, '0')}` };
}
