import { plannedDeviceId, type ApplyPatternArgs } from '@/lib/editor/commands';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { buildSnapshot, boxOf, centreOn, fitToBounds, visibleWorld } from '@/lib/editor/geometry';
import { placeInView } from '@/lib/editor/placement';
import { editorStore } from '@/lib/editor/store';
import type { TemplateId, TemplateOptions } from '@/lib/editor/templates';

/** Adds a palette device where the designer is looking, selects it and keeps it in view. */
export function addFromPalette(template: TemplateId, options: TemplateOptions): string | null {
  const state = editorStore.getState();
  const screen = canvasUiStore.getState().screen;
  const snapshot = buildSnapshot(state.doc);
  const view = visibleWorld(state.viewport, screen.width > 0 ? screen : { width: 800, height: 600 });
  const args = { template, options };
  const position = placeInView(state.doc, snapshot, args, view) ?? undefined;
  const id = plannedDeviceId(state.doc, { template });
  const result = state.run('addDevice', { ...args, position });
  if (!result.ok) return result.error.message;
  state.select([id]);
  if (!position) {
    const box = boxOf(buildSnapshot(result.doc), id);
    if (box) state.setViewport(centreOn(state.viewport, { x: box.x + box.width / 2, y: box.y + box.height / 2 }, screen));
  }
  return null;
}

/** Applies a pattern and shows all of the result. */
export function applyPatternFromPalette(args: ApplyPatternArgs): string | null {
  const state = editorStore.getState();
  const result = state.run('applyPattern', args);
  if (!result.ok) return result.error.message;
  state.clearSelection();
  state.setViewport(fitToBounds(buildSnapshot(result.doc).bounds, canvasUiStore.getState().screen, 40, 1));
  return null;
}
