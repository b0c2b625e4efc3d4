import { createEditorStore } from '@/lib/editor/store';
import {
  attachWorkingCopy,
  clearWorkingCopy,
  defaultStorage,
  memoryStorage,
  readWorkingCopy,
  workingCopyKey,
  writeWorkingCopy,
} from '@/lib/editor/working-copy';
import { harborRoadV1 } from '@/shared/fixtures/harbor-road';
import { smallDesign } from '@/tests/lib/editor/helpers/editor';

describe('the working copy in storage', () => {
  it('round-trips a document with its base version and time', () => {
    const storage = memoryStorage();
    const doc = harborRoadV1();
    expect(writeWorkingCopy(storage, 12, doc, 1, new Date('2026-03-02T09:30:00Z'))).toBe(true);
    expect(readWorkingCopy(storage, 12)).toEqual({ designId: '12', baseVersion: 1, savedAt: '2026-03-02T09:30:00.000Z', doc });
    expect(readWorkingCopy(storage, 13)).toBeNull();
    clearWorkingCopy(storage, 12);
    expect(readWorkingCopy(storage, 12)).toBeNull();
  });

  it('keeps one entry per design under a key of our own', () => {
    expect(workingCopyKey(12)).toBe('cablewright.working-copy.v1:12');
  });

  it.each([
    ['not JSON', '{oops'],
    ['the wrong shape', JSON.stringify({ hello: 'world' })],
    ['another design', JSON.stringify({ designId: '99', baseVersion: 1, savedAt: 'x', doc: smallDesign() })],
    ['an invalid document', JSON.stringify({ designId: '12', baseVersion: 1, savedAt: 'x', doc: { ...smallDesign(), cables: [{ id: 'c', a: 'nowhere', b: 'nothing', media: 'cat6' }] } })],
  ])('treats %s as absent and removes it', (_label, text) => {
    const storage = memoryStorage();
    storage.setItem(workingCopyKey(12), text);
    expect(readWorkingCopy(storage, 12)).toBeNull();
    expect(storage.entries.has(workingCopyKey(12))).toBe(false);
  });

  it('survives storage that throws on every call', () => {
    const broken = {
      getItem: () => {
        throw new Error('denied');
      },
      setItem: () => {
        throw new Error('quota');
      },
      removeItem: () => {
        throw new Error('denied');
      },
    };
    expect(readWorkingCopy(broken, 1)).toBeNull();
    expect(writeWorkingCopy(broken, 1, smallDesign(), null)).toBe(false);
    expect(() => clearWorkingCopy(broken, 1)).not.toThrow();
  });

  it('finds no storage in node', () => {
    expect(defaultStorage()).toBeNull();
  });
});

describe('keeping the store\'s working copy', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('writes a dirty document once edits pause, and removes it once saved', () => {
    const storage = memoryStorage();
    const store = createEditorStore();
    store.getState().load(smallDesign(), { designId: 5, baseVersion: 4 });
    const detach = attachWorkingCopy(store, storage, { debounceMs: 300 });
    const writes = jest.spyOn(storage, 'setItem');
    for (let i = 0; i < 10; i += 1) store.getState().run('moveDevice', { id: 'host-1', x: i * 10, y: 0 });
    expect(writes).not.toHaveBeenCalled();
    jest.advanceTimersByTime(300);
    expect(writes).toHaveBeenCalledTimes(1);
    expect(readWorkingCopy(storage, 5)?.doc.layout!['host-1']).toEqual({ x: 90, y: 0 });
    expect(readWorkingCopy(storage, 5)?.baseVersion).toBe(4);
    store.getState().markSaved(5);
    // At once, not after the pause: a reload right after saving must find no stale copy to offer.
    expect(readWorkingCopy(storage, 5)).toBeNull();
    jest.advanceTimersByTime(300);
    expect(readWorkingCopy(storage, 5)).toBeNull();
    detach();
  });

  it('neither writes nor clears when a document is opened, so a stored copy waits to be offered', () => {
    const storage = memoryStorage();
    writeWorkingCopy(storage, 5, { ...smallDesign(), name: 'offline edits' }, 4);
    const store = createEditorStore();
    const detach = attachWorkingCopy(store, storage, { debounceMs: 300 });
    store.getState().load(smallDesign(), { designId: 5, baseVersion: 4 });
    jest.advanceTimersByTime(1000);
    expect(readWorkingCopy(storage, 5)?.doc.name).toBe('offline edits');
    detach();
  });

  it('finishes a pending write for the design that was open when another one is loaded', () => {
    const storage = memoryStorage();
    const store = createEditorStore();
    store.getState().load(smallDesign(), { designId: 5, baseVersion: 4 });
    const detach = attachWorkingCopy(store, storage, { debounceMs: 300 });
    store.getState().run('renameDesign', { name: 'unsaved' });
    store.getState().load(smallDesign(), { designId: 6, baseVersion: 1 });
    jest.advanceTimersByTime(1000);
    expect(readWorkingCopy(storage, 5)?.doc.name).toBe('unsaved');
    expect(readWorkingCopy(storage, 6)).toBeNull();
    detach();
  });

  it('flushes what is pending when detached (leaving the canvas)', () => {
    const storage = memoryStorage();
    const store = createEditorStore();
    store.getState().load(smallDesign(), { designId: 5, baseVersion: 4 });
    const detach = attachWorkingCopy(store, storage);
    store.getState().run('renameDesign', { name: 'left quickly' });
    detach();
    expect(readWorkingCopy(storage, 5)?.doc.name).toBe('left quickly');
  });
});
