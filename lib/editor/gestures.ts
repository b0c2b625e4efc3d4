import { emptyRecord, recordFrom } from '@/shared/keys/record';
import { canvasUiStore, type CanvasUiStore } from '@/lib/editor/canvas-ui';
import { makeSnapshotSelector } from '@/lib/editor/hooks';
import { devicesInRect, hitTest, portsTooSmallToTap, type Hit } from '@/lib/editor/hit-test';
import { cableNow } from '@/lib/editor/quick-cable';
import type { Point } from '@/lib/editor/shape';
import { editorStore, type EditorStore } from '@/lib/editor/store';
import { FIT_MAX_ZOOM, fitPadding, fitToBounds, panBy, screenToWorld, snapToGrid, zoomAbout, zoomBy } from '@/lib/editor/viewport';

/**
 * What pointers do on the canvas, without any DOM: the canvas feeds screen points (CSS px from
 * the canvas's top-left) and this decides. A press on a device becomes a drag once it travels a
 * few pixels (moving the selection if the device is in it), else a tap that selects; a tap on a
 * port selects it and starts a cable, and a tap on a second port opens the cable chooser (or, on
 * a phone, makes the cable at once and says so in a notice with undo); a press on empty canvas
 * pans (touch) or draws a marquee (mouse); two touches pinch. A finger never has to hit a port
 * smaller than 44 × 44 CSS px: when ports are drawn smaller than that, a touch on a port or a card
 * selects the device and opens its port list instead of guessing which port was meant. The drag is
 * a preview (canvas-ui) until the pointer lifts, then one `moveDevices` command: one undo step.
 */
export type PointerKind = 'mouse' | 'touch' | 'pen';
export type PointerInput = { id: number; kind: PointerKind; point: Point; button?: number; additive?: boolean };

type Mode =
  | { kind: 'idle' }
  | { kind: 'press'; hit: Hit | null; start: Point; additive: boolean; pointerKind: PointerKind }
  | { kind: 'drag'; start: Point; from: Record<string, Point> }
  | { kind: 'pan'; last: Point }
  | { kind: 'marquee'; startWorld: Point; additive: boolean; base: string[] }
  | { kind: 'pinch'; distance: number; mid: Point; viewport: { x: number; y: number; zoom: number } };

/** Movement before a press counts as a drag: small for a mouse, larger for a finger. */
export const DRAG_THRESHOLD = { mouse: 4, pen: 6, touch: 10 } as const;

export type GestureOptions = {
  store?: EditorStore;
  ui?: CanvasUiStore;
  /** Marquee selection with a mouse on empty canvas (wide screens); otherwise empty canvas pans. */
  marquee?: () => boolean;
  /** Space held or the pan tool: every press pans. */
  panOnly?: () => boolean;
  /** The second port of a cable makes it at once, with a notice, instead of opening the chooser (phone). */
  directCable?: () => boolean;
};

export function createGestures(options: GestureOptions = {}) {
  const store = options.store ?? editorStore;
  const ui = options.ui ?? canvasUiStore;
  const marqueeAllowed = options.marquee ?? (() => true);
  const panOnly = options.panOnly ?? (() => store.getState().tool === 'pan');
  const directCable = options.directCable ?? (() => false);
  const snapshotOf = makeSnapshotSelector();
  const pointers = new Map<number, PointerInput>();
  let mode: Mode = { kind: 'idle' };

  const editor = () => store.getState();
  const world = (p: Point) => screenToWorld(editor().viewport, p);
  const snapshot = () => snapshotOf(editor());
  const setBusy = () => ui.setState({ busy: pointers.size > 0 });

  function pinchFrame(): { distance: number; mid: Point } {
    const [a, b] = [...pointers.values()];
    return { distance: Math.max(1, Math.hypot(a.point.x - b.point.x, a.point.y - b.point.y)), mid: { x: (a.point.x + b.point.x) / 2, y: (a.point.y + b.point.y) / 2 } };
  }

  function cancelPreview() {
    if (ui.getState().drag || ui.getState().marquee) ui.setState({ drag: null, marquee: null });
  }

  function down(input: PointerInput) {
    pointers.set(input.id, input);
    setBusy();
    if (pointers.size === 2 && [...pointers.values()].every((p) => p.kind === 'touch')) {
      cancelPreview();
      mode = { kind: 'pinch', ...pinchFrame(), viewport: editor().viewport };
      return;
    }
    if (pointers.size > 1) return;
    if (input.button === 1 || panOnly()) {
      mode = { kind: 'pan', last: input.point };
      return;
    }
    const zoom = editor().viewport.zoom;
    const hit = hitTest(snapshot(), world(input.point), { cableTolerance: 8 / zoom });
    if (!hit && input.kind === 'mouse' && marqueeAllowed()) {
      const startWorld = world(input.point);
      mode = { kind: 'marquee', startWorld, additive: !!input.additive, base: input.additive ? editor().selection : [] };
      return;
    }
    mode = { kind: 'press', hit, start: input.point, additive: !!input.additive, pointerKind: input.kind };
  }

  function beginDrag(hit: Hit, start: Point, additive: boolean): boolean {
    const state = editor();
    if (state.readOnly || hit.kind === 'cable') return false;
    const deviceId = hit.kind === 'device' ? hit.id : hit.deviceId;
    const snap = snapshot();
    const inSelection = state.selection.includes(deviceId);
    if (!inSelection) state.select(additive ? [...state.selection, deviceId] : [deviceId]);
    const ids = inSelection ? state.selection.filter((id) => snap.devices.has(id)) : additive ? [...state.selection.filter((id) => snap.devices.has(id)), deviceId] : [deviceId];
    // Keyed by device id: records without a prototype, so an id such as __proto__ is a key too.
    const from = recordFrom(ids.map((id) => [id, snap.devices.get(id)!.position] as const));
    mode = { kind: 'drag', start, from };
    ui.setState({ drag: { ids, from, moves: recordFrom(Object.entries(from)) } });
    return true;
  }

  function move(input: PointerInput) {
    if (pointers.has(input.id)) pointers.set(input.id, input);
    if (editor().pendingCableStart && mode.kind === 'idle') ui.setState({ pointer: world(input.point) });
    switch (mode.kind) {
      case 'pinch': {
        if (pointers.size < 2) return;
        const frame = pinchFrame();
        const panned = panBy(mode.viewport, frame.mid.x - mode.mid.x, frame.mid.y - mode.mid.y);
        editor().setViewport(zoomAbout(panned, frame.mid, mode.viewport.zoom * (frame.distance / mode.distance)));
        return;
      }
      case 'pan': {
        editor().setViewport(panBy(editor().viewport, input.point.x - mode.last.x, input.point.y - mode.last.y));
        mode = { kind: 'pan', last: input.point };
        return;
      }
      case 'press': {
        const moved = Math.hypot(input.point.x - mode.start.x, input.point.y - mode.start.y);
        if (moved < DRAG_THRESHOLD[mode.pointerKind]) return;
        const { hit, start, additive } = mode;
        if (hit && beginDrag(hit, start, additive)) return move(input);
        // A press on empty canvas or a cable that travels pans the view.
        mode = { kind: 'pan', last: start };
        return move(input);
      }
      case 'drag': {
        const zoom = editor().viewport.zoom;
        const dx = (input.point.x - mode.start.x) / zoom;
        const dy = (input.point.y - mode.start.y) / zoom;
        const moves = emptyRecord<Point>();
        for (const [id, p] of Object.entries(mode.from)) moves[id] = snapToGrid({ x: p.x + dx, y: p.y + dy });
        const drag = ui.getState().drag;
        if (drag && Object.keys(moves).every((id) => drag.moves[id].x === moves[id].x && drag.moves[id].y === moves[id].y)) return;
        ui.setState({ drag: { ids: Object.keys(moves), from: mode.from, moves } });
        return;
      }
      case 'marquee': {
        const p = world(input.point);
        ui.setState({ marquee: { x: mode.startWorld.x, y: mode.startWorld.y, width: p.x - mode.startWorld.x, height: p.y - mode.startWorld.y } });
        return;
      }
      default:
        return;
    }
  }

  /**
   * A touch on a port or card whose ports are too small for a finger: the device is selected (unless
   * a cable is being drawn from another one) and its ports are listed. The view stays as it is, so
   * the other end of a cable is still on screen.
   */
  function offerPorts(deviceId: string): void {
    const state = editor();
    ui.setState({ portList: { deviceId }, pointer: null });
    if (!state.pendingCableStart) state.select([deviceId]);
  }

  function tapPort(hit: Extract<Hit, { kind: 'port' }>, additive: boolean) {
    const state = editor();
    const pending = state.pendingCableStart;
    if (pending && pending !== hit.id && !state.readOnly && !additive) {
      if (directCable()) cableNow(hit.id, { store, ui });
      else ui.setState({ chooser: { a: pending, b: hit.id } });
      return;
    }
    if (pending === hit.id) {
      state.cancelCable();
      ui.setState({ pointer: null });
      return;
    }
    if (additive) state.toggleSelection(hit.id);
    else state.select([hit.id]);
    if (!state.readOnly && !additive) state.startCable(hit.id);
  }

  function tap(hit: Hit | null, additive: boolean, pointerKind: PointerKind) {
    const state = editor();
    ui.setState({ notice: null });
    if (!hit) {
      state.clearSelection();
      state.cancelCable();
      ui.setState({ pointer: null });
      return;
    }
    const fingertip = pointerKind !== 'mouse' && portsTooSmallToTap(state.viewport.zoom);
    if (fingertip && (hit.kind === 'port' || hit.kind === 'group')) return offerPorts(hit.deviceId);
    if (hit.kind === 'port') return tapPort(hit, additive);
    state.cancelCable();
    ui.setState({ pointer: null });
    if (additive) state.toggleSelection(hit.id);
    else state.select([hit.id]);
  }

  function up(input: PointerInput) {
    const current = mode;
    pointers.delete(input.id);
    setBusy();
    if (current.kind === 'pinch') {
      mode = pointers.size === 1 ? { kind: 'pan', last: [...pointers.values()][0].point } : { kind: 'idle' };
      return;
    }
    if (pointers.size > 0) return;
    mode = { kind: 'idle' };
    if (current.kind === 'press') tap(current.hit, current.additive, current.pointerKind);
    else if (current.kind === 'drag') {
      const drag = ui.getState().drag;
      ui.setState({ drag: null });
      const changed = drag && drag.ids.some((id) => drag.moves[id].x !== drag.from[id].x || drag.moves[id].y !== drag.from[id].y);
      if (drag && changed) editor().run('moveDevices', { positions: drag.moves });
    } else if (current.kind === 'marquee') {
      const rect = ui.getState().marquee;
      ui.setState({ marquee: null });
      if (rect) editor().select([...current.base, ...devicesInRect(snapshot(), rect)]);
      else if (!current.additive) {
        editor().clearSelection();
        editor().cancelCable();
      }
    }
  }

  function cancel(input?: PointerInput) {
    if (input) pointers.delete(input.id);
    else pointers.clear();
    setBusy();
    cancelPreview();
    mode = { kind: 'idle' };
  }

  /** Mouse wheel or trackpad pinch (ctrl+wheel): zoom about the pointer. */
  function wheel(point: Point, deltaY: number, pinch: boolean) {
    const factor = Math.exp(-deltaY * (pinch ? 0.01 : 0.0015));
    editor().setViewport(zoomBy(editor().viewport, point, factor));
  }

  function zoomStep(direction: 1 | -1) {
    const { width, height } = ui.getState().screen;
    editor().setViewport(zoomBy(editor().viewport, { x: width / 2, y: height / 2 }, direction > 0 ? 1.25 : 1 / 1.25));
  }

  function fit() {
    const screen = ui.getState().screen;
    editor().setViewport(fitToBounds(snapshot().bounds, screen, fitPadding(screen), FIT_MAX_ZOOM));
  }

  return { down, move, up, cancel, wheel, zoomStep, fit, get mode() { return mode.kind; } };
}

export type Gestures = ReturnType<typeof createGestures>;
