import { createCanvasUiStore } from '@/lib/editor/canvas-ui';
import { createGestures, DRAG_THRESHOLD } from '@/lib/editor/gestures';
import { buildSnapshot, portBox, worldToScreen } from '@/lib/editor/geometry';
import { createEditorStore } from '@/lib/editor/store';
import { GRID_SIZE } from '@/lib/editor/viewport';
import { smallDesign } from '@/tests/lib/editor/helpers/editor';

function setup(marquee = true) {
  const store = createEditorStore();
  store.getState().load(smallDesign(), { designId: 1, baseVersion: 1 });
  const ui = createCanvasUiStore();
  ui.setState({ screen: { width: 1200, height: 800 } });
  const gestures = createGestures({ store, ui, marquee: () => marquee });
  const snap = () => buildSnapshot(store.getState().doc);
  const screen = (p: { x: number; y: number }) => worldToScreen(store.getState().viewport, p);
  const header = (id: string) => {
    const r = snap().devices.get(id)!.rect;
    return screen({ x: r.x + 10, y: r.y + 10 });
  };
  const port = (id: string) => screen(portBox(snap(), id)!.anchor);
  const tap = (point: { x: number; y: number }, extra: { additive?: boolean; kind?: 'mouse' | 'touch' } = {}) => {
    gestures.down({ id: 1, kind: extra.kind ?? 'mouse', point, additive: extra.additive });
    gestures.up({ id: 1, kind: extra.kind ?? 'mouse', point });
  };
  const past = () => store.temporal.getState().pastStates.length;
  return { store, ui, gestures, snap, header, port, tap, past };
}

describe('canvas gestures', () => {
  it('selects a device with a tap and adds to the selection with shift', () => {
    const { store, header, tap } = setup();
    tap(header('host-1'));
    expect(store.getState().selection).toEqual(['host-1']);
    tap(header('switch-1'), { additive: true });
    expect(store.getState().selection).toEqual(['host-1', 'switch-1']);
    tap({ x: 1190, y: 790 });
    expect(store.getState().selection).toEqual([]);
  });

  it('drags a device on the grid as a preview and commits one undo step when the pointer lifts', () => {
    const { store, ui, gestures, header, past } = setup();
    const start = header('host-2');
    const before = store.getState().doc.layout!['host-2'];
    gestures.down({ id: 1, kind: 'mouse', point: start });
    for (let i = 1; i <= 10; i += 1) gestures.move({ id: 1, kind: 'mouse', point: { x: start.x + i * 7, y: start.y + i * 3 } });
    // During the drag the document is untouched; the preview holds snapped positions.
    expect(store.getState().doc.layout!['host-2']).toEqual(before);
    const preview = ui.getState().drag!.moves['host-2'];
    expect([preview.x % GRID_SIZE, preview.y % GRID_SIZE]).toEqual([0, 0]);
    expect(ui.getState().busy).toBe(true);
    gestures.up({ id: 1, kind: 'mouse', point: { x: start.x + 70, y: start.y + 30 } });
    expect(store.getState().doc.layout!['host-2']).toEqual({ x: before.x + 80, y: before.y + 40 });
    expect([past(), ui.getState().drag, ui.getState().busy]).toEqual([1, null, false]);
    store.getState().undo();
    expect(store.getState().doc.layout!['host-2']).toEqual(before);
  });

  it('moves the whole selection when a selected device is dragged', () => {
    const { store, gestures, header, tap } = setup();
    tap(header('host-1'));
    tap(header('host-2'), { additive: true });
    const start = header('host-1');
    gestures.down({ id: 1, kind: 'mouse', point: start });
    gestures.move({ id: 1, kind: 'mouse', point: { x: start.x + 40, y: start.y } });
    gestures.up({ id: 1, kind: 'mouse', point: { x: start.x + 40, y: start.y } });
    expect([store.getState().doc.layout!['host-1'].x, store.getState().doc.layout!['host-2'].x]).toEqual([40, 540]);
  });

  it('treats a press that moves less than the threshold as a tap', () => {
    const { store, gestures, header, past } = setup();
    const start = header('switch-2');
    gestures.down({ id: 1, kind: 'touch', point: start });
    gestures.move({ id: 1, kind: 'touch', point: { x: start.x + DRAG_THRESHOLD.touch - 1, y: start.y } });
    gestures.up({ id: 1, kind: 'touch', point: start });
    expect([store.getState().selection, past()]).toEqual([['switch-2'], 0]);
  });

  it('cables two ports with a tap on each: the second opens the chooser', () => {
    const { store, ui, port, tap } = setup();
    tap(port('host-1-card-1-p1'));
    expect([store.getState().selection, store.getState().pendingCableStart]).toEqual([['host-1-card-1-p1'], 'host-1-card-1-p1']);
    tap(port('switch-1-p4'));
    expect(ui.getState().chooser).toEqual({ a: 'host-1-card-1-p1', b: 'switch-1-p4' });
    const result = store.getState().finishCable('switch-1-p4');
    expect(result.ok).toBe(true);
    expect(store.getState().doc.cables.map((c) => [c.a, c.b])).toEqual([['host-1-card-1-p1', 'switch-1-p4']]);
  });

  it('drops the cable start when the same port is tapped again', () => {
    const { store, ui, port, tap } = setup();
    tap(port('host-1-card-1-p1'));
    tap(port('host-1-card-1-p1'));
    expect([store.getState().pendingCableStart, ui.getState().chooser]).toEqual([null, null]);
  });

  it('never starts a cable or a drag in read-only mode', () => {
    const { store, ui, gestures, port, header, tap } = setup();
    store.getState().load(store.getState().doc, { designId: 1, baseVersion: 1, readOnly: true });
    tap(port('host-1-card-1-p1'));
    tap(port('switch-1-p4'));
    expect([store.getState().pendingCableStart, ui.getState().chooser]).toEqual([null, null]);
    const start = header('host-1');
    gestures.down({ id: 1, kind: 'mouse', point: start });
    gestures.move({ id: 1, kind: 'mouse', point: { x: start.x + 100, y: start.y } });
    expect(ui.getState().drag).toBeNull();
    gestures.up({ id: 1, kind: 'mouse', point: { x: start.x + 100, y: start.y } });
    expect(store.getState().doc.layout!['host-1']).toEqual({ x: 0, y: 0 });
  });

  it('selects the devices a mouse marquee touches, and pans with a finger instead', () => {
    const { store, ui, gestures } = setup();
    gestures.down({ id: 1, kind: 'mouse', point: { x: -5, y: -30 } });
    gestures.move({ id: 1, kind: 'mouse', point: { x: 900, y: 20 } });
    expect(ui.getState().marquee).not.toBeNull();
    gestures.up({ id: 1, kind: 'mouse', point: { x: 900, y: 20 } });
    expect(store.getState().selection).toEqual(['host-1', 'host-2']);
    gestures.down({ id: 2, kind: 'touch', point: { x: 1000, y: 700 } });
    gestures.move({ id: 2, kind: 'touch', point: { x: 950, y: 650 } });
    gestures.up({ id: 2, kind: 'touch', point: { x: 950, y: 650 } });
    expect(store.getState().viewport).toEqual({ x: 50, y: 50, zoom: 1 });
  });

  it('zooms about the middle of a two-finger pinch', () => {
    const { store, gestures } = setup();
    gestures.down({ id: 1, kind: 'touch', point: { x: 400, y: 400 } });
    gestures.down({ id: 2, kind: 'touch', point: { x: 600, y: 400 } });
    gestures.move({ id: 2, kind: 'touch', point: { x: 800, y: 400 } });
    const v = store.getState().viewport;
    expect(v.zoom).toBeCloseTo(2);
    // The world point under the new middle (600, 400) is the one that was under the old middle (500, 400).
    expect([v.x + 600 / v.zoom, v.y + 400 / v.zoom]).toEqual([500, 400]);
    gestures.up({ id: 1, kind: 'touch', point: { x: 400, y: 400 } });
    gestures.up({ id: 2, kind: 'touch', point: { x: 800, y: 400 } });
    expect(store.getState().selection).toEqual([]);
  });

  it('zooms with the wheel about the pointer and fits the drawing', () => {
    const { store, gestures, snap } = setup();
    gestures.wheel({ x: 100, y: 100 }, -200, false);
    const v = store.getState().viewport;
    expect(v.zoom).toBeGreaterThan(1);
    expect([v.x + 100 / v.zoom, v.y + 100 / v.zoom].map((n) => Math.round(n * 1e6) / 1e6)).toEqual([100, 100]);
    gestures.fit();
    const bounds = snap().bounds!;
    const fit = store.getState().viewport;
    expect(bounds.width * fit.zoom).toBeLessThanOrEqual(1200 - 80 + 1e-9);
  });
});
