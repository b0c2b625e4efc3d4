import { createEditorStore, selectDirty, type EditorStore } from '@/lib/editor/store';
import { makeSnapshotSelector } from '@/lib/editor/hooks';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { expectValid, smallDesign } from '@/tests/lib/editor/helpers/editor';

function opened(): EditorStore {
  const store = createEditorStore();
  store.getState().load(smallDesign(), { designId: 7, baseVersion: 2 });
  return store;
}

const past = (store: EditorStore) => store.temporal.getState().pastStates.length;
const future = (store: EditorStore) => store.temporal.getState().futureStates.length;

describe('loading a document', () => {
  it('sets the design, base version and a clean state, and is not undoable', () => {
    const store = opened();
    store.getState().run('renameDevice', { id: 'host-1', name: 'wms-db-1' });
    store.getState().load(harborRoadV2(), { designId: 7, baseVersion: 3 });
    const state = store.getState();
    expect([state.designId, state.baseVersion, selectDirty(state), past(store), future(store)]).toEqual([7, 3, false, 0, 0]);
    state.undo();
    expect(store.getState().doc.name).toBe('Harbor Road storage');
  });

  it('starts dirty when a restored working copy is loaded over the server document', () => {
    const store = createEditorStore();
    const server = smallDesign();
    store.getState().load({ ...server, name: 'edited offline' }, { designId: 7, baseVersion: 2, savedDoc: server });
    expect(selectDirty(store.getState())).toBe(true);
  });
});

describe('running commands', () => {
  it('records each command as one undoable step and marks the copy dirty', () => {
    const store = opened();
    const result = store.getState().run('addDevice', { template: 'host' });
    expect(result.ok).toBe(true);
    expect(selectDirty(store.getState())).toBe(true);
    store.getState().run('renameDevice', { id: 'host-3', name: 'cam-rec-1' });
    expect(past(store)).toBe(2);
    store.getState().undo();
    expect(store.getState().doc.devices.find((d) => d.id === 'host-3')?.name).toBe('host-3');
    store.getState().undo();
    expect(store.getState().doc.devices.some((d) => d.id === 'host-3')).toBe(false);
    expect(selectDirty(store.getState())).toBe(false); // back to exactly what was loaded
    store.getState().redo();
    store.getState().redo();
    expect(store.getState().doc.devices.find((d) => d.id === 'host-3')?.name).toBe('cam-rec-1');
  });

  it('leaves document and history alone when a command is refused, and says why', () => {
    const store = opened();
    const before = store.getState().doc;
    const result = store.getState().run('cablePorts', { a: 'switch-1-p1', b: 'switch-1-p1' });
    expect(result.ok).toBe(false);
    expect(store.getState().doc).toBe(before);
    expect(past(store)).toBe(0);
    expect(store.getState().lastError?.code).toBe('refused');
  });

  it('records no step for a command that changes nothing', () => {
    const store = opened();
    store.getState().run('renameDevice', { id: 'host-1', name: 'host-1' });
    expect(past(store)).toBe(0);
  });

  it('refuses every edit in read-only mode', () => {
    const store = createEditorStore();
    store.getState().load(smallDesign(), { designId: 7, baseVersion: 2, readOnly: true });
    expect(store.getState().run('addDevice', { template: 'host' })).toMatchObject({ ok: false, error: { code: 'read-only' } });
  });

  it('never records selection, tool or viewport changes', () => {
    const store = opened();
    const s = store.getState();
    s.select(['host-1', 'host-2']);
    s.toggleSelection('host-2');
    s.setTool('cable');
    s.setViewport({ x: 10, y: 20, zoom: 1.5 });
    expect(past(store)).toBe(0);
    expect(store.getState().selection).toEqual(['host-1']);
  });

  it('drops deleted ids from the selection, and undo does not bring back a stale one', () => {
    const store = opened();
    store.getState().select(['host-1', 'switch-1']);
    store.getState().run('deleteDevices', { ids: ['host-1'] });
    expect(store.getState().selection).toEqual(['switch-1']);
    store.getState().run('addDevice', { template: 'data-switch' });
    store.getState().select(['switch-3']);
    store.getState().undo();
    expect(store.getState().selection).toEqual([]);
  });
});

describe('dragging', () => {
  it('makes one undo step of a whole drag', () => {
    const store = opened();
    const start = store.getState().doc.layout!['host-1'];
    store.getState().beginGesture();
    for (let i = 1; i <= 25; i += 1) store.getState().run('moveDevice', { id: 'host-1', x: start.x + i * 4, y: start.y });
    store.getState().endGesture();
    expect(past(store)).toBe(1);
    expect(store.getState().doc.layout!['host-1']).toEqual({ x: start.x + 100, y: start.y });
    store.getState().undo();
    expect(store.getState().doc.layout!['host-1']).toEqual(start);
    store.getState().redo();
    expect(store.getState().doc.layout!['host-1']).toEqual({ x: start.x + 100, y: start.y });
  });

  it('records nothing for a drag that ends where it began, and cancel restores the start', () => {
    const store = opened();
    const start = store.getState().doc;
    store.getState().beginGesture();
    store.getState().endGesture();
    expect(past(store)).toBe(0);
    store.getState().beginGesture();
    store.getState().run('moveDevice', { id: 'host-1', x: 999, y: 999 });
    store.getState().cancelGesture();
    expect(store.getState().doc).toBe(start);
    expect(past(store)).toBe(0);
    store.getState().run('renameDevice', { id: 'host-1', name: 'after' });
    expect(past(store)).toBe(1); // recording resumed after the cancelled drag
  });

  it('clears the redo list when a drag follows an undo', () => {
    const store = opened();
    store.getState().run('renameDevice', { id: 'host-1', name: 'a' });
    store.getState().undo();
    expect(future(store)).toBe(1);
    store.getState().beginGesture();
    store.getState().run('moveDevice', { id: 'host-1', x: 5, y: 5 });
    store.getState().endGesture();
    expect([past(store), future(store)]).toEqual([1, 0]);
  });
});

describe('drawing a cable with the cable tool', () => {
  it('cables the pending port to the next one with remembered defaults per connector', () => {
    const store = opened();
    const s = store.getState();
    s.setTool('cable');
    s.startCable('host-1-card-1-p1');
    const first = store.getState().finishCable('switch-1-p1', { media: 'cat6', lengthM: 7 });
    expect(first.ok).toBe(true);
    expect(store.getState().pendingCableStart).toBeNull();
    store.getState().startCable('host-2-card-1-p1');
    store.getState().finishCable('switch-1-p2');
    const cables = store.getState().doc.cables;
    expect(cables.map((c) => [c.label, c.media, c.lengthM])).toEqual([
      ['C001', 'cat6', 7],
      ['C002', 'cat6', 7],
    ]);
    expect(store.getState().cableDefaults.sfp.media).toBe('dac');
    expectValid(store.getState().doc);
  });

  it('keeps the pending port when the cable is refused', () => {
    const store = opened();
    store.getState().startCable('switch-1-p1');
    expect(store.getState().finishCable('switch-1-p1').ok).toBe(false);
    expect(store.getState().pendingCableStart).toBe('switch-1-p1');
    store.getState().setTool('select');
    expect(store.getState().pendingCableStart).toBeNull();
  });

  it('does not give a deleted newest cable number to the next cable', () => {
    const store = opened();
    store.getState().run('cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    store.getState().run('cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    store.getState().run('uncable', { ids: ['cable-2'] });
    store.getState().run('cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p3' });
    expect(store.getState().doc.cables.map((c) => c.label)).toEqual(['C001', 'C003']);
  });
});

describe('saving', () => {
  it('marks the sent document saved under the new base version, even if edits came in meanwhile', () => {
    const store = opened();
    store.getState().run('renameDevice', { id: 'host-1', name: 'sent' });
    const sent = store.getState().doc;
    store.getState().run('renameDevice', { id: 'host-2', name: 'typed while saving' });
    store.getState().markSaved(3, sent);
    expect(store.getState().baseVersion).toBe(3);
    expect(selectDirty(store.getState())).toBe(true);
    store.getState().undo();
    expect(selectDirty(store.getState())).toBe(false);
    expect(store.getState().doc.devices.find((d) => d.id === 'host-1')?.name).toBe('sent');
  });
});

describe('the snapshot selector', () => {
  it('returns the same snapshot for the same document and reuses boxes across a move', () => {
    const store = opened();
    const select = makeSnapshotSelector();
    const first = select(store.getState());
    store.getState().select(['host-1']);
    expect(select(store.getState())).toBe(first);
    store.getState().run('moveDevice', { id: 'host-1', x: 0, y: -200 });
    const second = select(store.getState());
    expect(second).not.toBe(first);
    expect(second.devices.get('switch-1')).toBe(first.devices.get('switch-1'));
  });
});
