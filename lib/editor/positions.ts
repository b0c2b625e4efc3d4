import { positionOf } from '@/shared/topology/layout';
import type { Device, Topology } from '@/shared/topology/schema';
import { deviceShape, type Point, type Rect } from '@/lib/editor/shape';

/** Where devices are drawn, and the extent of a drawing. */

/** Room left between devices placed automatically because the layout has no position for them. */
const UNPLACED_GAP = 40;

/**
 * Positions of all devices: the layout's, and for devices it lacks, a row under everything placed
 * (deterministic, so a document without layout still draws without overlaps).
 */
export function resolvePositions(doc: Topology): Map<string, Point> {
  const positions = new Map<string, Point>();
  let bottom = -Infinity;
  let left = Infinity;
  const unplaced: Device[] = [];
  for (const device of doc.devices) {
    const p = positionOf(doc, device.id);
    if (!p) {
      unplaced.push(device);
      continue;
    }
    positions.set(device.id, p);
    bottom = Math.max(bottom, p.y + deviceShape(device).height);
    left = Math.min(left, p.x);
  }
  let x = Number.isFinite(left) ? left : 0;
  const y = Number.isFinite(bottom) ? bottom + 2 * UNPLACED_GAP : 0;
  for (const device of unplaced) {
    positions.set(device.id, { x, y });
    x += deviceShape(device).width + UNPLACED_GAP;
  }
  return positions;
}

/** The union of the boxes; null when there are none. */
export function boundsOf(devices: Iterable<{ rect: Rect }>): Rect | null {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const { rect } of devices) {
    minX = Math.min(minX, rect.x);
    minY = Math.min(minY, rect.y);
    maxX = Math.max(maxX, rect.x + rect.width);
    maxY = Math.max(maxY, rect.y + rect.height);
  }
  return Number.isFinite(minX) ? { x: minX, y: minY, width: maxX - minX, height: maxY - minY } : null;
}

