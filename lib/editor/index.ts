/**
 * The canvas editor's model, without any drawing. What the canvas, inspector and networks screen
 * build on:
 *
 * - commands: every edit as a named pure function `(doc, args) => doc`, run by name through the
 *   store (`run('cablePorts', {a, b})`) or `runCommand`; a refusal is a CommandError with a
 *   plain sentence and the field at fault. `planned…` helpers tell which id an add will create.
 * - templates: the palette's devices and their options.
 * - geometry: the render snapshot (device boxes, shapes in device coordinates, cable end points),
 *   hit-testing, viewport math and grid snapping — pure functions, incremental for drags.
 * - store: the zustand store with undo/redo (zundo), selection, tool, viewport, cable drawing and
 *   drags as one undo step; selector hooks live in `@/lib/editor/hooks` (React).
 * - working-copy: the working document per design in local storage.
 */
export * from '@/lib/editor/commands';
export * from '@/lib/editor/errors';
export * from '@/lib/editor/geometry';
export { computeArrangement, type ArrangeOptions } from '@/lib/editor/arrange';
export * from '@/lib/editor/templates';
export * from '@/lib/editor/store';
export * from '@/lib/editor/working-copy';
export { cableLabel, nextCableNumber } from '@/lib/editor/ids';
