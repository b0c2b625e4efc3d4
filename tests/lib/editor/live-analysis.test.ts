import { createEditorStore } from '@/lib/editor/store';
import { attachLiveAnalysis, createLiveAnalysisStore } from '@/lib/editor/live-analysis';
import { smallDesign } from '@/tests/lib/editor/helpers/editor';

beforeEach(() => jest.useFakeTimers());
afterEach(() => jest.useRealTimers());

function setup(busy = { value: false }) {
  const store = createEditorStore();
  const live = createLiveAnalysisStore();
  store.getState().load(smallDesign(), { designId: 1, baseVersion: 1 });
  const detach = attachLiveAnalysis(store, live, { debounceMs: 200, retryMs: 50, isBusy: () => busy.value });
  return { store, live, detach, busy };
}

describe('live analysis', () => {
  it('analyses an opened document at once and an edit only after the pause', () => {
    const { store, live, detach } = setup();
    jest.advanceTimersByTime(0);
    expect(live.getState().doc).toBe(store.getState().doc);
    store.getState().run('cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    expect(live.getState().pending).toBe(true);
    jest.advanceTimersByTime(150);
    expect(live.getState().doc).not.toBe(store.getState().doc);
    jest.advanceTimersByTime(60);
    expect([live.getState().doc === store.getState().doc, live.getState().pending]).toEqual([true, false]);
    detach();
  });

  it('runs once for a burst of edits', () => {
    const { store, live, detach } = setup();
    jest.advanceTimersByTime(0);
    const spy = jest.fn();
    const unsubscribe = live.subscribe((s, p) => s.report !== p.report && spy());
    for (let i = 0; i < 5; i += 1) {
      store.getState().run('renameDevice', { id: 'host-1', name: `wms-db-${i}` });
      jest.advanceTimersByTime(100);
    }
    jest.advanceTimersByTime(200);
    expect(spy).toHaveBeenCalledTimes(1);
    expect(live.getState().report!.findings.some((f) => f.message.includes('wms-db-4'))).toBe(true);
    unsubscribe();
    detach();
  });

  it('waits while a gesture is in progress and runs when it ends', () => {
    const { store, live, detach, busy } = setup();
    jest.advanceTimersByTime(0);
    store.getState().run('renameDevice', { id: 'host-2', name: 'cam-rec-1' });
    busy.value = true;
    jest.advanceTimersByTime(1000);
    expect(live.getState().doc).not.toBe(store.getState().doc);
    busy.value = false;
    jest.advanceTimersByTime(50);
    expect(live.getState().doc).toBe(store.getState().doc);
    detach();
  });

  it('stops when detached', () => {
    const { store, live, detach } = setup();
    jest.advanceTimersByTime(0);
    detach();
    store.getState().run('renameDevice', { id: 'host-2', name: 'cam-rec-1' });
    jest.advanceTimersByTime(1000);
    expect(live.getState().doc).not.toBe(store.getState().doc);
  });
});
