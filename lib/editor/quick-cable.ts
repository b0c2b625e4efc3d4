import { canvasUiStore, type CanvasUiStore } from '@/lib/editor/canvas-ui';
import { plannedCable } from '@/lib/editor/commands';
import { portLabel } from '@/lib/editor/describe';
import { MEDIA_LABELS } from '@/lib/editor/drawing';
import { editorStore, type EditorStore } from '@/lib/editor/store';

/**
 * Making a cable without a dialog (the phone's tap-tap, "Connect to…" and the port lists): the
 * pending start port to `portId` with the remembered media and length for its connector. The
 * selection is cleared so no settings sheet covers the canvas; a short notice says what was made
 * and offers Undo and the cable's settings. Returns the refusal's sentence, or null.
 */
type Stores = { store?: EditorStore; ui?: CanvasUiStore };

export function cableNow(portId: string, { store = editorStore, ui = canvasUiStore }: Stores = {}): string | null {
  const state = store.getState();
  const from = state.pendingCableStart;
  if (!from) return 'Choose the port where the cable starts first.';
  const planned = plannedCable(state.doc, state.cableNumberFloor);
  const result = state.finishCable(portId);
  if (!result.ok) return result.error.message;
  const cable = result.doc.cables.find((c) => c.id === planned.id) ?? result.doc.cables[result.doc.cables.length - 1];
  const length = cable.lengthM === undefined ? 'length not set' : `${cable.lengthM} m`;
  const text = `Cable ${cable.label ?? cable.id} made: ${portLabel(result.doc, cable.a)} → ${portLabel(result.doc, cable.b)} (${MEDIA_LABELS[cable.media]}, ${length}).`;
  store.getState().clearSelection();
  ui.setState({ pointer: null, chooser: null, portList: null, connectFrom: null, notice: { cableId: cable.id, text, doc: result.doc } });
  return null;
}

/**
 * Undo of the cable in the notice: one step back when nothing changed since it was made, else the
 * cable alone is removed (a later edit is not thrown away with it).
 */
export function undoNoticedCable({ store = editorStore, ui = canvasUiStore }: Stores = {}): void {
  const notice = ui.getState().notice;
  if (!notice) return;
  const state = store.getState();
  if (state.doc === notice.doc) state.undo();
  else if (state.doc.cables.some((c) => c.id === notice.cableId)) state.run('uncable', { ids: [notice.cableId] });
  ui.setState({ notice: null });
}

/** The notice's "Cable settings": the cable selected, so its sheet opens because it was asked for. */
export function openNoticedCable({ store = editorStore, ui = canvasUiStore }: Stores = {}): void {
  const notice = ui.getState().notice;
  if (!notice) return;
  if (store.getState().doc.cables.some((c) => c.id === notice.cableId)) store.getState().select([notice.cableId]);
  ui.setState({ notice: null });
}
