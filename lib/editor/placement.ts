import { runCommand, type AddDeviceArgs } from '@/lib/editor/commands';
import { rectsIntersect, segmentMeetsRect } from '@/lib/editor/hit-test';
import { deviceShape, type Point, type Rect } from '@/lib/editor/shape';
import type { Snapshot } from '@/lib/editor/snapshot';
import { snapToGrid, GRID_SIZE } from '@/lib/editor/viewport';
import type { Topology } from '@/shared/topology/schema';

/**
 * Where a device added from the palette goes: the free spot nearest the middle of what is on
 * screen, so the designer sees it land; rings of candidates around the centre are tried until one
 * clears every box by a grid step and lies on no cable (a device dropped over cables looks cabled
 * to them). Failing that, the nearest spot that clears the boxes; null when the view is too crowded
 * (the command then places it right of the drawing).
 */
export function placeInView(doc: Topology, snapshot: Snapshot, args: AddDeviceArgs, view: Rect): Point | null {
  const probe = runCommand(doc, 'addDevice', args);
  const device = probe.devices[probe.devices.length - 1];
  const { width, height } = deviceShape(device);
  const centre = { x: view.x + view.width / 2 - width / 2, y: view.y + view.height / 2 - height / 2 };
  const boxes = [...snapshot.devices.values()].map((b) => b.rect);
  const margin = GRID_SIZE;
  const lines = [...snapshot.cables.values()];
  const grown = (p: Point) => ({ x: p.x - margin, y: p.y - margin, width: width + 2 * margin, height: height + 2 * margin });
  const clearOfBoxes = (p: Point) => !boxes.some((b) => rectsIntersect(b, grown(p)));
  const clearOfCables = (p: Point) => !lines.some((line) => segmentMeetsRect(line.a, line.b, grown(p)));
  let fallback: Point | null = null;
  for (const p of ringsAround(centre, 3 * GRID_SIZE, 30)) {
    if (!clearOfBoxes(p)) continue;
    if (clearOfCables(p)) return p;
    fallback ??= p;
  }
  return fallback;
}

/** Grid-snapped candidates in square rings around `centre`, nearest ring first. */
function* ringsAround(centre: Point, step: number, rings: number): Generator<Point> {
  const at = (dx: number, dy: number) => snapToGrid({ x: centre.x + dx * step, y: centre.y + dy * step });
  for (let ring = 0; ring < rings; ring += 1) {
    for (let dx = -ring; dx <= ring; dx += 1) for (const dy of ring === 0 ? [0] : [-ring, ring]) yield at(dx, dy);
    for (let dy = -ring + 1; dy <= ring - 1; dy += 1) for (const dx of [-ring, ring]) yield at(dx, dy);
  }
}
