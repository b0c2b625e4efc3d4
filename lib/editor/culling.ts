import type { Rect } from '@/lib/editor/shape';
import type { CableLine, DeviceBox, Snapshot } from '@/lib/editor/snapshot';
import { visibleWorld, type Size, type Viewport } from '@/lib/editor/viewport';

/**
 * What the canvas draws: only the devices and cables that meet the visible part of the world,
 * widened by half a screen each way and snapped outward to a coarse grid of tiles, so that panning
 * changes the drawn set only now and then (not on every move) and a zoomed-in 300-device design
 * keeps a few dozen groups in the DOM instead of twenty thousand elements. Below `DETAIL_ZOOM`
 * the labels inside devices and the cable tags are left out: they would be under 4 px tall.
 */
export const DETAIL_ZOOM = 0.35;
const TILE = 512;

export function cullRect(v: Viewport, screen: Size): Rect {
  const view = visibleWorld(v, screen);
  const mx = view.width / 2;
  const my = view.height / 2;
  const x0 = Math.floor((view.x - mx) / TILE) * TILE;
  const y0 = Math.floor((view.y - my) / TILE) * TILE;
  const x1 = Math.ceil((view.x + view.width + mx) / TILE) * TILE;
  const y1 = Math.ceil((view.y + view.height + my) / TILE) * TILE;
  return { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}

function meets(r: Rect, x0: number, y0: number, x1: number, y1: number): boolean {
  return r.x <= x1 && r.x + r.width >= x0 && r.y <= y1 && r.y + r.height >= y0;
}

/** The snapshot's devices and cables that meet `rect`, in drawing order; everything when all of it does. */
export function cull(snapshot: Snapshot, rect: Rect): Pick<Snapshot, 'devices' | 'cables'> {
  const { x: x0, y: y0 } = rect;
  const x1 = rect.x + rect.width;
  const y1 = rect.y + rect.height;
  if (!snapshot.bounds || !meets(snapshot.bounds, x0, y0, x1, y1)) return { devices: new Map(), cables: new Map() };
  const b = snapshot.bounds;
  if (b.x >= x0 && b.y >= y0 && b.x + b.width <= x1 && b.y + b.height <= y1) return snapshot;
  const devices = new Map<string, DeviceBox>();
  for (const [id, box] of snapshot.devices) if (meets(box.rect, x0, y0, x1, y1)) devices.set(id, box);
  const cables = new Map<string, CableLine>();
  for (const [id, line] of snapshot.cables) {
    if (devices.has(line.aDevice) || devices.has(line.bDevice)) cables.set(id, line);
    else if (meets({ x: Math.min(line.a.x, line.b.x), y: Math.min(line.a.y, line.b.y), width: Math.abs(line.a.x - line.b.x), height: Math.abs(line.a.y - line.b.y) }, x0, y0, x1, y1)) cables.set(id, line);
  }
  return { devices, cables };
}
