import { graphlib, layout } from '@dagrejs/dagre';
import { emptyRecord, type IdRecord } from '@/shared/keys/record';
import { tupleKey } from '@/shared/keys/tuple';
import type { Device, Position, Topology } from '@/shared/topology/schema';
import { deviceShape } from '@/lib/editor/shape';
import { GRID_SIZE } from '@/lib/editor/viewport';

/**
 * Auto-arrange: a layered drawing in three bands — hosts on top, switches in the middle, arrays at
 * the bottom — with the order inside each band taken from dagre's layered layout (Sugiyama-style
 * crossing reduction, Gansner et al. 1993), so cables cross as little as dagre can manage. Bands are
 * then packed left to right from the real device widths, which is what guarantees no two boxes
 * overlap whatever dagre returns; a band too wide for a screen wraps onto more rows. Management
 * links are left out of the ordering (they join the management switch to everything and would
 * only pull it into the middle); management switches
 * go at the right end of the switch band, beside the fabrics they are kept apart from.
 *
 * dagre's graph keeps nodes in plain objects, so it is given names of our own (`n` and the
 * device's place in the document), never the device ids: an id such as `constructor` would
 * otherwise be a node before it is added.
 */
export type ArrangeOptions = { origin?: Position; bandGap?: number; deviceGap?: number; maxRowWidth?: number };

/**
 * A band wider than this wraps onto further rows (in the same order), so 250 hosts make a block
 * the canvas can show, not one line 80,000 px long. Harbor Road's bands stay on one row each.
 */
export const MAX_ROW_WIDTH = 3200;

const BAND_OF: Record<Device['kind'], number> = { host: 0, switch: 1, array: 2 };

function isManagementSwitch(device: Device): boolean {
  return device.kind === 'switch' && device.role === 'management';
}

/** Device-level links of the data paths between bands, counted per pair. */
function dataLinks(doc: Topology): Map<string, { from: Device; to: Device; count: number }> {
  const owner = new Map<string, { device: Device; role: string }>();
  for (const device of doc.devices) {
    const groups = device.kind === 'array' ? device.controllers : device.kind === 'host' ? device.adapters : [{ ports: device.ports }];
    for (const group of groups) for (const port of group.ports) owner.set(port.id, { device, role: port.role });
  }
  const links = new Map<string, { from: Device; to: Device; count: number }>();
  for (const cable of doc.cables) {
    const a = owner.get(cable.a);
    const b = owner.get(cable.b);
    if (!a || !b || a.device === b.device) continue;
    if (a.role === 'management' || b.role === 'management') continue;
    if (isManagementSwitch(a.device) || isManagementSwitch(b.device)) continue;
    const [from, to] = BAND_OF[a.device.kind] <= BAND_OF[b.device.kind] ? [a.device, b.device] : [b.device, a.device];
    if (BAND_OF[from.kind] === BAND_OF[to.kind]) continue;
    const key = tupleKey([from.id, to.id]);
    const link = links.get(key);
    if (link) link.count += 1;
    else links.set(key, { from, to, count: 1 });
  }
  return links;
}

/** dagre's horizontal position of every device, used only to order each band. */
function dagreOrder(doc: Topology): Map<string, number> {
  const graph = new graphlib.Graph({ multigraph: false });
  graph.setGraph({ rankdir: 'TB', nodesep: 40, ranksep: 120 });
  graph.setDefaultEdgeLabel(() => ({}));
  const names = new Map<string, string>();
  doc.devices.forEach((device, i) => {
    const shape = deviceShape(device);
    names.set(device.id, `n${i}`);
    graph.setNode(`n${i}`, { width: shape.width, height: shape.height });
  });
  for (const { from, to, count } of dataLinks(doc).values()) {
    graph.setEdge(names.get(from.id)!, names.get(to.id)!, { minlen: BAND_OF[to.kind] - BAND_OF[from.kind], weight: count });
  }
  layout(graph);
  const xs = new Map<string, number>();
  for (const device of doc.devices) xs.set(device.id, graph.node(names.get(device.id)!)?.x ?? 0);
  return xs;
}

function bands(doc: Topology, xs: Map<string, number>): Device[][] {
  const index = new Map(doc.devices.map((d, i) => [d.id, i]));
  const byX = (a: Device, b: Device) => xs.get(a.id)! - xs.get(b.id)! || index.get(a.id)! - index.get(b.id)!;
  const hosts = doc.devices.filter((d) => d.kind === 'host').sort(byX);
  const fabric = doc.devices.filter((d) => d.kind === 'switch' && !isManagementSwitch(d)).sort(byX);
  const management = doc.devices.filter(isManagementSwitch).sort((a, b) => index.get(a.id)! - index.get(b.id)!);
  const arrays = doc.devices.filter((d) => d.kind === 'array').sort(byX);
  return [hosts, [...fabric, ...management], arrays].filter((band) => band.length > 0);
}

const snapUp = (value: number) => Math.ceil(value / GRID_SIZE) * GRID_SIZE;

/** New canvas positions for every device of the document (grid-aligned, no overlaps). */
export function computeArrangement(doc: Topology, options: ArrangeOptions = {}): IdRecord<Position> {
  const origin = options.origin ?? { x: 0, y: 0 };
  const bandGap = options.bandGap ?? 160;
  const deviceGap = options.deviceGap ?? 40;
  const maxRowWidth = options.maxRowWidth ?? MAX_ROW_WIDTH;
  if (doc.devices.length === 0) return emptyRecord();
  const widthOf = (row: Device[]) => row.reduce((sum, d) => sum + deviceShape(d).width, 0) + deviceGap * (row.length - 1);
  const bandRows = bands(doc, dagreOrder(doc)).map((band) => wrap(band, maxRowWidth, deviceGap));
  const widest = Math.max(...bandRows.flat().map(widthOf));
  const positions = emptyRecord<Position>();
  let y = snapUp(origin.y);
  for (const rows of bandRows) {
    rows.forEach((row, index) => {
      // Centre each row under the widest one; ceil to the grid keeps the order and the gaps.
      let x = origin.x + (widest - widthOf(row)) / 2;
      let tallest = 0;
      for (const device of row) {
        const shape = deviceShape(device);
        x = snapUp(x);
        positions[device.id] = { x, y };
        x += shape.width + deviceGap;
        tallest = Math.max(tallest, shape.height);
      }
      y = snapUp(y + tallest + (index === rows.length - 1 ? bandGap : 2 * deviceGap));
    });
  }
  return positions;
}

/** A band cut into rows no wider than `max` (a device wider than that gets a row of its own). */
function wrap(band: Device[], max: number, gap: number): Device[][] {
  const rows: Device[][] = [];
  let row: Device[] = [];
  let width = 0;
  for (const device of band) {
    const w = deviceShape(device).width;
    if (row.length > 0 && width + gap + w > max) {
      rows.push(row);
      row = [];
      width = 0;
    }
    width += (row.length > 0 ? gap : 0) + w;
    row.push(device);
  }
  if (row.length > 0) rows.push(row);
  return rows;
}
