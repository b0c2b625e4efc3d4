import type { Cable, Device, Position, SwitchRole, Topology } from '@/shared/topology/schema';
import { deviceShape, type DeviceShape, type Point, type Rect } from '@/lib/editor/shape';

/**
 * The render snapshot: every device's box, group boxes, port rectangles, tap targets and anchors,
 * and every cable's two end points, in world coordinates. The canvas draws it and hit-tests
 * against it; it never computes geometry itself.
 *
 * Building is incremental: pass the previous snapshot and every device box whose device object and
 * position are unchanged is reused as is (same identity, so a memoised component skips it), and so
 * is every cable line whose cable and both end devices are unchanged. A drag that moves one device
 * recomputes that device's box and its cables only.
 */
export type GroupBox = { id: string; deviceId: string; name: string; rect: Rect };
export type PortBox = {
  id: string;
  deviceId: string;
  groupId?: string;
  name: string;
  role: 'data' | 'management';
  /** The drawn port. */
  rect: Rect;
  /** The tappable area, at least 44 × 44 at zoom 1. */
  target: Rect;
  /** Where cables attach: the port's centre. */
  anchor: Point;
};
export type DeviceBox = {
  id: string;
  kind: Device['kind'];
  name: string;
  switchRole?: SwitchRole;
  source: Device;
  position: Point;
  rect: Rect;
  header: Rect;
  groups: GroupBox[];
  ports: PortBox[];
};
export type CableLine = { id: string; source: Cable; a: Point; b: Point; aPort: string; bPort: string; aDevice: string; bDevice: string };

export type Snapshot = {
  /** The document this snapshot was built from. */
  doc: Topology;
  /** Device boxes in document order (later ones are drawn on top). */
  devices: ReadonlyMap<string, DeviceBox>;
  cables: ReadonlyMap<string, CableLine>;
  /** Port id → its device and its index in that device's `ports`. */
  portOwner: ReadonlyMap<string, { deviceId: string; index: number }>;
  cablesByDevice: ReadonlyMap<string, readonly string[]>;
  /** The union of all device boxes; null for an empty design. */
  bounds: Rect | null;
};

/** Room left between devices placed automatically because the layout has no position for them. */
const UNPLACED_GAP = 40;

function boxAt(device: Device, shape: DeviceShape, position: Point): DeviceBox {
  const { x, y } = position;
  const move = (r: Rect): Rect => ({ x: r.x + x, y: r.y + y, width: r.width, height: r.height });
  return {
    id: device.id,
    kind: device.kind,
    name: device.name,
    switchRole: device.kind === 'switch' ? device.role : undefined,
    source: device,
    position,
    rect: { x, y, width: shape.width, height: shape.height },
    header: move(shape.header),
    groups: shape.groups.map((g) => ({ id: g.id, deviceId: device.id, name: g.name, rect: move(g.rect) })),
    ports: shape.ports.map((p) => ({
      id: p.id,
      deviceId: device.id,
      groupId: p.groupId,
      name: p.name,
      role: p.role,
      rect: move(p.rect),
      target: move(p.target),
      anchor: { x: p.anchor.x + x, y: p.anchor.y + y },
    })),
  };
}

/**
 * Positions of all devices: the layout's, and for devices it lacks, a row under everything placed
 * (deterministic, so a document without layout still draws without overlaps).
 */
export function resolvePositions(doc: Topology): Map<string, Point> {
  const layout: Record<string, Position> = doc.layout ?? {};
  const positions = new Map<string, Point>();
  let bottom = -Infinity;
  let left = Infinity;
  const unplaced: Device[] = [];
  for (const device of doc.devices) {
    const p = layout[device.id];
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

function samePoint(a: Point, b: Point): boolean {
  return a.x === b.x && a.y === b.y;
}

function indexPorts(doc: Topology): Map<string, { deviceId: string; index: number }> {
  const owners = new Map<string, { deviceId: string; index: number }>();
  for (const device of doc.devices) {
    deviceShape(device).ports.forEach((p, index) => owners.set(p.id, { deviceId: device.id, index }));
  }
  return owners;
}

function indexCables(doc: Topology, owners: Snapshot['portOwner']): Map<string, string[]> {
  const byDevice = new Map<string, string[]>();
  const add = (deviceId: string | undefined, cableId: string) => {
    if (!deviceId) return;
    const list = byDevice.get(deviceId);
    if (!list) byDevice.set(deviceId, [cableId]);
    else if (list[list.length - 1] !== cableId) list.push(cableId);
  };
  for (const cable of doc.cables) {
    add(owners.get(cable.a)?.deviceId, cable.id);
    add(owners.get(cable.b)?.deviceId, cable.id);
  }
  return byDevice;
}

function lineFor(cable: Cable, devices: ReadonlyMap<string, DeviceBox>, owners: Snapshot['portOwner']): CableLine | null {
  const a = owners.get(cable.a);
  const b = owners.get(cable.b);
  const portA = a && devices.get(a.deviceId)?.ports[a.index];
  const portB = b && devices.get(b.deviceId)?.ports[b.index];
  if (!a || !b || !portA || !portB) return null;
  return { id: cable.id, source: cable, a: portA.anchor, b: portB.anchor, aPort: cable.a, bPort: cable.b, aDevice: a.deviceId, bDevice: b.deviceId };
}

export function boundsOf(devices: Iterable<DeviceBox>): Rect | null {
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

/** The snapshot of a document, reusing whatever of `previous` is still right. */
export function buildSnapshot(doc: Topology, previous?: Snapshot): Snapshot {
  const sameDevices = previous !== undefined && previous.doc.devices === doc.devices;
  const portOwner = sameDevices ? previous.portOwner : indexPorts(doc);
  const sameCables = sameDevices && previous.doc.cables === doc.cables;
  const cablesByDevice = sameCables ? previous.cablesByDevice : indexCables(doc, portOwner);

  const positions = resolvePositions(doc);
  const devices = new Map<string, DeviceBox>();
  const reused = new Set<string>();
  for (const device of doc.devices) {
    const position = positions.get(device.id)!;
    const old = previous?.devices.get(device.id);
    if (old && old.source === device && samePoint(old.position, position)) {
      devices.set(device.id, old);
      reused.add(device.id);
    } else {
      devices.set(device.id, boxAt(device, deviceShape(device), position));
    }
  }

  const cables = new Map<string, CableLine>();
  for (const cable of doc.cables) {
    const old = previous?.cables.get(cable.id);
    const keep = old && old.source === cable && reused.has(old.aDevice) && reused.has(old.bDevice);
    const line = keep ? old : lineFor(cable, devices, portOwner);
    if (line) cables.set(cable.id, line);
  }
  return { doc, devices, cables, portOwner, cablesByDevice, bounds: boundsOf(devices.values()) };
}

/**
 * The snapshot with some devices drawn at new positions, without touching the document: for a
 * drag preview. Only the moved boxes and their cables are recomputed.
 */
export function withMovedDevices(snapshot: Snapshot, moves: Readonly<Record<string, Point>>): Snapshot {
  const devices = new Map(snapshot.devices);
  const touched = new Set<string>();
  let moved = false;
  for (const [id, position] of Object.entries(moves)) {
    const box = devices.get(id);
    if (!box || samePoint(box.position, position)) continue;
    moved = true;
    devices.set(id, boxAt(box.source, deviceShape(box.source), { x: position.x, y: position.y }));
    for (const cableId of snapshot.cablesByDevice.get(id) ?? []) touched.add(cableId);
  }
  if (!moved) return snapshot;
  const cables = new Map(snapshot.cables);
  for (const cableId of touched) {
    const line = cables.get(cableId);
    const next = line && lineFor(line.source, devices, snapshot.portOwner);
    if (next) cables.set(cableId, next);
  }
  return { ...snapshot, devices, cables, bounds: boundsOf(devices.values()) };
}

/** A port's box in the snapshot, or undefined for an unknown id. */
export function portBox(snapshot: Snapshot, portId: string): PortBox | undefined {
  const owner = snapshot.portOwner.get(portId);
  return owner ? snapshot.devices.get(owner.deviceId)?.ports[owner.index] : undefined;
}
