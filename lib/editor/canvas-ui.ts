import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Point, Rect } from '@/lib/editor/shape';
import type { CableTagMode } from '@/lib/editor/drawing';
import type { Size } from '@/lib/editor/viewport';

/**
 * What the canvas is doing this instant, apart from the document: a drag's preview positions,
 * the marquee, where the pointer is while a cable is being drawn, the cable chooser, and the
 * canvas's size, the phone's port lists and the notice of a cable just made. None of it is undoable or saved; a drag becomes one command when it ends.
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
  /** A device whose ports are listed because they are drawn too small to tap (phone). */
  portList: { deviceId: string } | null;
  /** The port whose "Connect to…" list is open. */
  connectFrom: string | null;
  /** The cable just made, confirmed in a short notice with undo. */
  notice: CableNotice | null;
  /** What cable tags say: fabric and medium, or the printed label. */
  cableTags: CableTagMode;
  /** A pointer is down or a pinch is on: the live analysis waits. */
  busy: boolean;
  screen: Size;
};

/** `doc` is the document the cable made, so Undo knows whether anything changed since. */
export type CableNotice = { cableId: string; text: string; doc: unknown };

export type CanvasUiStore = StoreApi<CanvasUiState>;

export function createCanvasUiStore(): CanvasUiStore {
  return createStore<CanvasUiState>()(() => ({ drag: null, marquee: null, pointer: null, chooser: null, portList: null, connectFrom: null, notice: null, cableTags: 'fabric', busy: false, screen: { width: 0, height: 0 } }));
}

export const canvasUiStore = createCanvasUiStore();
