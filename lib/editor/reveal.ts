import type { Rect } from '@/lib/editor/shape';
import { clampZoom, type Size, type Viewport } from '@/lib/editor/viewport';

/**
 * On a phone the inspector sheet covers the lower part of the canvas: a tapped thing is brought
 * into the part still showing, zoomed to at least `minZoom` so its labels can be read. The view
 * does not move when the thing is already readable and uncovered.
 */
export function revealAbove(v: Viewport, target: Rect, screen: Size, visibleHeight: number, minZoom = 0.8): Viewport {
  const zoom = clampZoom(Math.min(1, Math.max(v.zoom, minZoom)));
  const left = (target.x - v.x) * v.zoom;
  const top = (target.y - v.y) * v.zoom;
  const inside = left >= 0 && top >= 0 && left + target.width * v.zoom <= screen.width && top + target.height * v.zoom <= visibleHeight;
  if (zoom === v.zoom && inside) return v;
  const cx = target.x + target.width / 2;
  const cy = target.y + target.height / 2;
  return { x: cx - screen.width / (2 * zoom), y: cy - visibleHeight / (2 * zoom), zoom };
}
