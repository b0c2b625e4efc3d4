import type { Point, Rect } from '@/lib/editor/shape';

/**
 * Viewport math. A viewport is the world point shown at the screen's top-left corner and a zoom
 * factor: screen = (world − origin) × zoom. Screen points are in CSS px relative to the canvas.
 */
export type Viewport = { x: number; y: number; zoom: number };
export type Size = { width: number; height: number };

/** Low enough that fitting a few hundred devices laid out in long bands still shows all of them. */
export const MIN_ZOOM = 0.02;
export const MAX_ZOOM = 4;
export const DEFAULT_VIEWPORT: Viewport = { x: 0, y: 0, zoom: 1 };
export const GRID_SIZE = 20;

export function clampZoom(zoom: number): number {
  if (!Number.isFinite(zoom)) return 1;
  return Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, zoom));
}

export function worldToScreen(v: Viewport, p: Point): Point {
  return { x: (p.x - v.x) * v.zoom, y: (p.y - v.y) * v.zoom };
}

export function screenToWorld(v: Viewport, p: Point): Point {
  return { x: p.x / v.zoom + v.x, y: p.y / v.zoom + v.y };
}

/** Moves the view by a screen distance (a pan gesture's delta). */
export function panBy(v: Viewport, dx: number, dy: number): Viewport {
  return { x: v.x - dx / v.zoom, y: v.y - dy / v.zoom, zoom: v.zoom };
}

/** Zooms so that the world point under `screenPoint` stays under it (wheel, pinch centre). */
export function zoomAbout(v: Viewport, screenPoint: Point, zoom: number): Viewport {
  const next = clampZoom(zoom);
  const world = screenToWorld(v, screenPoint);
  return { x: world.x - screenPoint.x / next, y: world.y - screenPoint.y / next, zoom: next };
}

/** Zoom by a factor (1.2 in, 1/1.2 out) about a screen point. */
export function zoomBy(v: Viewport, screenPoint: Point, factor: number): Viewport {
  return zoomAbout(v, screenPoint, v.zoom * factor);
}

/** Fit may enlarge a small drawing this far, so it fills the view instead of sitting small in the middle. */
export const FIT_MAX_ZOOM = 1.5;

/** The margin fit leaves around the drawing: 40 px on a wide canvas, less on a phone (never under 12). */
export function fitPadding(screen: Size): number {
  return Math.round(Math.min(40, Math.max(12, 0.04 * screen.width)));
}

/** The viewport that shows `bounds` whole and centred, never zoomed in beyond `maxZoom`. */
export function fitToBounds(bounds: Rect | null, screen: Size, padding = 40, maxZoom = 1): Viewport {
  if (!bounds || screen.width <= 0 || screen.height <= 0) return DEFAULT_VIEWPORT;
  const room = { width: Math.max(1, screen.width - 2 * padding), height: Math.max(1, screen.height - 2 * padding) };
  const zoom = clampZoom(Math.min(maxZoom, room.width / Math.max(1, bounds.width), room.height / Math.max(1, bounds.height)));
  const centre = { x: bounds.x + bounds.width / 2, y: bounds.y + bounds.height / 2 };
  return { x: centre.x - screen.width / (2 * zoom), y: centre.y - screen.height / (2 * zoom), zoom };
}

/** The viewport moved so a world point is at the screen's centre (tap on a finding). */
export function centreOn(v: Viewport, world: Point, screen: Size): Viewport {
  return { x: world.x - screen.width / (2 * v.zoom), y: world.y - screen.height / (2 * v.zoom), zoom: v.zoom };
}

/** The part of the world on screen, for culling what need not be drawn. */
export function visibleWorld(v: Viewport, screen: Size): Rect {
  return { x: v.x, y: v.y, width: screen.width / v.zoom, height: screen.height / v.zoom };
}

/** A point snapped to the canvas grid (drag to move). */
export function snapToGrid(p: Point, grid = GRID_SIZE): Point {
  if (grid <= 0) return { x: p.x, y: p.y };
  return { x: Math.round(p.x / grid) * grid, y: Math.round(p.y / grid) * grid };
}
