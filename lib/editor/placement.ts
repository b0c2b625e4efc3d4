import { runCommand, type AddDeviceArgs } from '@/lib/editor/commands';
import { rectsIntersect } from '@/lib/editor/hit-test';
import { deviceShape, type Point, type Rect } from '@/lib/editor/shape';
import type { Snapshot } from '@/lib/editor/snapshot';
import { snapToGrid, GRID_SIZE } from '@/lib/editor/viewport';
import type { Topology } from '@/shared/topology/schema';

/**
 * Where a device added from the palette goes: the free spot nearest the middle of what is on
 * screen, so the designer sees it land; rows of candidates below and beside the centre are tried
 * until one clears every box by a grid step. Null when the view is too crowded (the command then
 * places it right of the drawing).
 */
export function placeInView(doc: Topology, snapshot: Snapshot, args: AddDeviceArgs, view: Rect): Point | null {
  const probe = runCommand(doc, 'addDevice', args);
  const device = probe.devices[probe.devices.length - 1];
  const { width, height } = deviceShape(device);
  const centre = { x: view.x + view.width / 2 - width / 2, y: view.y + view.height / 2 - height / 2 };
  const boxes = [...snapshot.devices.values()].map((b) => b.rect);
  const margin = GRID_SIZE;
  const free = (p: Point) => {
    const rect = { x: p.x - margin, y: p.y - margin, width: width + 2 * margin, height: height + 2 * margin };
    return !boxes.some((b) => rectsIntersect(b, rect));
  };
  const step = 3 * GRID_SIZE;
  for (let ring = 0; ring < 30; ring += 1) {
    for (let dx = -ring; dx <= ring; dx += 1) {
      for (const dy of ring === 0 ? [0] : [-ring, ring]) {
        const p = snapToGrid({ x: centre.x + dx * step, y: centre.y + dy * step });
        if (free(p)) return p;
      }
    }
    for (let dy = -ring + 1; dy <= ring - 1; dy += 1) {
      for (const dx of [-ring, ring]) {
        const p = snapToGrid({ x: centre.x + dx * step, y: centre.y + dy * step });
        if (free(p)) return p;
      }
    }
  }
  return null;
}
