import { z } from 'zod';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { selectDirty, type DesignId, type EditorState, type EditorStore } from '@/lib/editor/store';

/**
 * The working copy of each design kept in the browser's localStorage, so a reload, a crash or a
 * lost connection loses nothing that was drawn. One entry per design under a key of our own, with
 * the version it started from and when it was written. Reading is tolerant: anything that is not
 * a well-formed entry holding a valid topology document is treated as absent (and removed), never
 * thrown. Storage is injected, so node tests pass an in-memory one.
 */
export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;
export type WorkingCopy = { designId: string; baseVersion: number | null; savedAt: string; doc: Topology };

const KEY_PREFIX = 'cablewright.working-copy.v1:';

export function workingCopyKey(designId: DesignId): string {
  return `${KEY_PREFIX}${String(designId)}`;
}

const entrySchema = z
  .object({
    designId: z.string(),
    baseVersion: z.number().int().positive().nullable(),
    savedAt: z.string(),
    doc: z.unknown(),
  })
  .strict();

/** localStorage when the platform has a usable one (web), else null. */
export function defaultStorage(): KeyValueStorage | null {
  try {
    const storage = (globalThis as { localStorage?: Storage }).localStorage;
    if (!storage) return null;
    const probe = `${KEY_PREFIX}probe`;
    storage.setItem(probe, '1');
    storage.removeItem(probe);
    return storage;
  } catch {
    // Private browsing modes and disabled storage throw on access.
    return null;
  }
}

export function readWorkingCopy(storage: KeyValueStorage, designId: DesignId): WorkingCopy | null {
  const key = workingCopyKey(designId);
  let text: string | null;
  try {
    text = storage.getItem(key);
  } catch {
    return null;
  }
  if (text === null) return null;
  try {
    const entry = entrySchema.safeParse(JSON.parse(text));
    const checked = entry.success && entry.data.designId === String(designId) ? validateTopology(entry.data.doc) : null;
    if (entry.success && checked?.ok) return { ...entry.data, doc: checked.doc };
  } catch {
    // Not JSON: fall through and drop it.
  }
  clearWorkingCopy(storage, designId);
  return null;
}

/** Writes the working copy; false when storage refused (quota, disabled). */
export function writeWorkingCopy(storage: KeyValueStorage, designId: DesignId, doc: Topology, baseVersion: number | null, now: Date = new Date()): boolean {
  const entry: WorkingCopy = { designId: String(designId), baseVersion, savedAt: now.toISOString(), doc };
  try {
    storage.setItem(workingCopyKey(designId), JSON.stringify(entry));
    return true;
  } catch {
    return false;
  }
}

export function clearWorkingCopy(storage: KeyValueStorage, designId: DesignId): void {
  try {
    storage.removeItem(workingCopyKey(designId));
  } catch {
    // Nothing to do: storage that cannot remove cannot have kept much either.
  }
}

export type AttachOptions = { debounceMs?: number; now?: () => Date };

/**
 * Keeps the store's working copy in storage: a dirty document is written a moment after the last
 * change (not on every pointer move of a drag), and the entry is removed once the work is saved
 * (markSaved) or edited back to the saved state. Opening a document (`load`) neither writes nor
 * clears: the screen reads the stored copy before loading, offers to restore it (load it with
 * `savedDoc` set to the server's document) or clears it when the designer declines. Returns a
 * function that flushes what is pending and detaches.
 */
export function attachWorkingCopy(store: EditorStore, storage: KeyValueStorage, options: AttachOptions = {}): () => void {
  const debounceMs = options.debounceMs ?? 400;
  const now = options.now ?? (() => new Date());
  let timer: ReturnType<typeof setTimeout> | null = null;

  const persist = (state: EditorState) => {
    if (state.designId === null || state.readOnly) return;
    if (selectDirty(state)) writeWorkingCopy(storage, state.designId, state.doc, state.baseVersion, now());
    else clearWorkingCopy(storage, state.designId);
  };
  const cancel = () => {
    if (timer) clearTimeout(timer);
    timer = null;
  };
  const unsubscribe = store.subscribe((state, previous) => {
    if (state.session !== previous.session) {
      // A pending write belongs to the document that was open before; finish it for that one.
      if (timer) persist(previous);
      cancel();
      return;
    }
    if (state.doc === previous.doc && state.savedDoc === previous.savedDoc) return;
    cancel();
    if (state.savedDoc !== previous.savedDoc) {
      // A save is one discrete step: clear (or rewrite) at once, so a reload right after it finds no stale copy.
      persist(state);
      return;
    }
    timer = setTimeout(() => {
      timer = null;
      persist(store.getState());
    }, debounceMs);
  });
  return () => {
    unsubscribe();
    if (timer) persist(store.getState());
    cancel();
  };
}

/** An in-memory storage for tests and for platforms without localStorage. */
export function memoryStorage(): KeyValueStorage & { entries: Map<string, string> } {
  const entries = new Map<string, string>();
  return {
    entries,
    getItem: (key) => entries.get(key) ?? null,
    setItem: (key, value) => void entries.set(key, String(value)),
    removeItem: (key) => void entries.delete(key),
  };
}
