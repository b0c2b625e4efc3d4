import { PORT_PITCH, type Point, type Rect } from '@/lib/editor/shape';
import type { Snapshot } from '@/lib/editor/snapshot';

/**
 * What lies under a point of the canvas (world coordinates). The topmost device wins — devices
 * drawn later are on top — and inside it the most specific part: a port's tap target, then a
 * controller or card, then the device. Cables are drawn under devices, so they are hit only
 * where no device is, within a tolerance that the caller scales by zoom (8 screen px / zoom).
 */
export type Hit =
  | { kind: 'port'; id: string; deviceId: string }
  | { kind: 'group'; id: string; deviceId: string }
  | { kind: 'device'; id: string }
  | { kind: 'cable'; id: string };

/** The least a finger's target may measure on screen, in CSS px (WCAG 2.1 SC 2.5.5; common platform guidance). */
export const MIN_TAP_TARGET = 44;

/** How wide a port's tap target is on screen at this zoom. */
export function portTargetOnScreen(zoom: number): number {
  return PORT_PITCH * zoom;
}

/** Ports drawn too small for a finger: a touch then opens the device's port list instead. */
export function portsTooSmallToTap(zoom: number): boolean {
  return portTargetOnScreen(zoom) < MIN_TAP_TARGET - 1e-9;
}

export function rectContains(rect: Rect, point: Point): boolean {
  return point.x >= rect.x && point.x <= rect.x + rect.width && point.y >= rect.y && point.y <= rect.y + rect.height;
}

export function rectsIntersect(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** Distance from a point to the segment a–b. */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / lengthSquared));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/** Whether the segment a–b passes through the rectangle (Liang–Barsky clipping against its four sides). */
export function segmentMeetsRect(a: Point, b: Point, rect: Rect): boolean {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  let t0 = 0;
  let t1 = 1;
  const sides: [number, number][] = [
    [-dx, a.x - rect.x],
    [dx, rect.x + rect.width - a.x],
    [-dy, a.y - rect.y],
    [dy, rect.y + rect.height - a.y],
  ];
  for (const [p, q] of sides) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

export type HitOptions = { cableTolerance?: number };

export function hitTest(snapshot: Snapshot, point: Point, options: HitOptions = {}): Hit | null {
  const boxes = Array.from(snapshot.devices.values());
  for (let i = boxes.length - 1; i >= 0; i -= 1) {
    const box = boxes[i];
    if (!rectContains(box.rect, point)) continue;
    // Shapes are in device coordinates: move the point there instead of moving every port.
    const local = { x: point.x - box.position.x, y: point.y - box.position.y };
    const port = box.shape.ports.find((p) => rectContains(p.target, local));
    if (port) return { kind: 'port', id: port.id, deviceId: box.id };
    const group = box.shape.groups.find((g) => rectContains(g.rect, local));
    if (group) return { kind: 'group', id: group.id, deviceId: box.id };
    return { kind: 'device', id: box.id };
  }
  const tolerance = options.cableTolerance ?? 8;
  let best: { id: string; distance: number } | null = null;
  for (const line of snapshot.cables.values()) {
    const distance = distanceToSegment(point, line.a, line.b);
    if (distance <= tolerance && (!best || distance < best.distance)) best = { id: line.id, distance };
  }
  return best ? { kind: 'cable', id: best.id } : null;
}

/** Devices whose box meets a rectangle (marquee selection), in document order. */
export function devicesInRect(snapshot: Snapshot, rect: Rect): string[] {
  const normal = normalizeRect(rect);
  const ids: string[] = [];
  for (const box of snapshot.devices.values()) if (rectsIntersect(box.rect, normal)) ids.push(box.id);
  return ids;
}

/** A rectangle dragged up or left has a negative size; this turns it the right way round. */
export function normalizeRect(rect: Rect): Rect {
  const x = Math.min(rect.x, rect.x + rect.width);
  const y = Math.min(rect.y, rect.y + rect.height);
  return { x, y, width: Math.abs(rect.width), height: Math.abs(rect.height) };
}

/** Pairs of devices whose boxes overlap: empty for a tidy canvas. */
export function overlappingDevices(snapshot: Snapshot): [string, string][] {
  const boxes = Array.from(snapshot.devices.values()).sort((a, b) => a.rect.x - b.rect.x);
  const pairs: [string, string][] = [];
  for (let i = 0; i < boxes.length; i += 1) {
    const a = boxes[i];
    for (let j = i + 1; j < boxes.length && boxes[j].rect.x < a.rect.x + a.rect.width; j += 1) {
      if (rectsIntersect(a.rect, boxes[j].rect)) pairs.push([a.id, boxes[j].id]);
    }
  }
  return pairs;
}
