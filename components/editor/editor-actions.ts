import { Platform } from 'react-native';
import { emptyRecord } from '@/shared/keys/record';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { exportSvg } from '@/lib/editor/export-svg';
import { buildSnapshot, fitToBounds, GRID_SIZE, zoomAbout } from '@/lib/editor/geometry';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import type { Gestures } from '@/lib/editor/gestures';
import type { ShortcutAction } from '@/lib/editor/shortcuts';

/** The toolbar's and the keyboard's edits and view moves, each a store action or one named command. */
export function deleteSelection(): void {
  const state = editorStore.getState();
  if (state.readOnly || state.selection.length === 0) return;
  const result = state.run('deleteItems', { ids: state.selection });
  if (result.ok) state.clearSelection();
}

export function arrange(): void {
  const state = editorStore.getState();
  const result = state.run('autoArrange', {});
  if (result.ok) state.setViewport(fitToBounds(buildSnapshot(result.doc).bounds, canvasUiStore.getState().screen, 40, 1));
}

export function nudge(dx: number, dy: number): void {
  const state = editorStore.getState();
  if (state.readOnly) return;
  const snapshot = buildSnapshot(state.doc);
  const positions = emptyRecord<{ x: number; y: number }>();
  for (const id of state.selection) {
    const box = snapshot.devices.get(id);
    if (box) positions[id] = { x: box.position.x + dx * GRID_SIZE, y: box.position.y + dy * GRID_SIZE };
  }
  if (Object.keys(positions).length > 0) state.run('moveDevices', { positions });
}

export function escape(): void {
  const state = editorStore.getState();
  if (canvasUiStore.getState().chooser) canvasUiStore.setState({ chooser: null });
  else if (state.pendingCableStart) {
    state.cancelCable();
    canvasUiStore.setState({ pointer: null });
  } else state.clearSelection();
}

/** A file name from the design's name: "Harbor Road storage" → "harbor-road-storage.svg". */
export function svgFileName(name: string): string {
  const slug = name.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80);
  return `${slug || 'design'}.svg`;
}

/** Builds the diagram's SVG and hands it to the browser's download; false where there is no browser. */
export function downloadDiagram(): boolean {
  const doc = editorStore.getState().doc;
  const live = liveAnalysisStore.getState();
  const svg = exportSvg(buildSnapshot(doc), { marks: live.doc === doc ? live.marks : undefined });
  if (Platform.OS !== 'web' || typeof document === 'undefined') return false;
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = svgFileName(doc.name);
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 0);
  return true;
}

type Handlers = { gestures: Gestures; openSave: () => void; openHelp: () => void };

export function runShortcut(action: ShortcutAction, { gestures, openSave, openHelp }: Handlers): void {
  const state = editorStore.getState();
  const screen = canvasUiStore.getState().screen;
  switch (action) {
    case 'undo':
      return state.undo();
    case 'redo':
      return state.redo();
    case 'delete':
      return deleteSelection();
    case 'arrange':
      return state.readOnly ? undefined : arrange();
    case 'fit':
      return gestures.fit();
    case 'zoomIn':
      return gestures.zoomStep(1);
    case 'zoomOut':
      return gestures.zoomStep(-1);
    case 'zoomReset':
      return state.setViewport(zoomAbout(state.viewport, { x: screen.width / 2, y: screen.height / 2 }, 1));
    case 'escape':
      return escape();
    case 'help':
      return openHelp();
    case 'save':
      return state.readOnly ? undefined : openSave();
    case 'selectAll':
      return state.select(state.doc.devices.map((d) => d.id));
    case 'nudgeLeft':
      return nudge(-1, 0);
    case 'nudgeRight':
      return nudge(1, 0);
    case 'nudgeUp':
      return nudge(0, -1);
    case 'nudgeDown':
      return nudge(0, 1);
  }
}
