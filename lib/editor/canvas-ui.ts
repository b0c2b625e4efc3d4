import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Point, Rect } from '@/lib/editor/shape';
import type { Size } from '@/lib/editor/viewport';

/**
 * What the canvas is doing this instant, apart from the document: a drag's preview positions,
 * the marquee, where the pointer is while a cable is being drawn, the cable chooser, and the
 * canvas's size. None of it is undoable or saved; a drag becomes one command when it ends.
 */
export type DragPreview = {
  ids: string[];
  /** Positions when the drag began. */
  from: Record<string, Point>;
  /** Snapped positions now. */
  moves: Record<string, Point>;
};

export type CanvasUiState = {
  drag: DragPreview | null;
  marquee: Rect | null;
  /** World point under the pointer, kept only while a cable start is pending (the rubber band). */
  pointer: Point | null;
  /** The two ports of a cable waiting for its media and length. */
  chooser: { a: string; b: string } | null;
  /** A pointer is down or a pinch is on: the live analysis waits. */
  busy: boolean;
  screen: Size;
};

export type CanvasUiStore = StoreApi<CanvasUiState>;

export function createCanvasUiStore(): CanvasUiStore {
  return createStore<CanvasUiState>()(() => ({ drag: null, marquee: null, pointer: null, chooser: null, busy: false, screen: { width: 0, height: 0 } }));
}

export const canvasUiStore = createCanvasUiStore();
