import type { Cable, Device, SwitchRole, Topology } from '@/shared/topology/schema';
import { boundsOf, resolvePositions } from '@/lib/editor/positions';
import { deviceShape, type DeviceShape, type Point, type Rect } from '@/lib/editor/shape';

/**
 * The render snapshot: every device's box and position, and every cable's two end points, in world
 * coordinates. A device's inside (header, controllers or cards, ports, tap targets) is its shape
 * in the device's own coordinates, computed once per device object: the canvas draws it inside a
 * group translated to `position`, so moving a device changes one transform and nothing inside.
 * World coordinates of a part are computed on demand (portBox, groupBox). The canvas draws the
 * snapshot and hit-tests against it; it never computes geometry itself.
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
  connector: 'rj45' | 'sfp';
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
  /** Top-left corner in the world; the shape is drawn translated by it. */
  position: Point;
  rect: Rect;
  /** Header, groups and ports in the device's own coordinates. */
  shape: DeviceShape;
};
export type CableLine = { id: string; source: Cable; a: Point; b: Point; aPort: string; bPort: string; aDevice: string; bDevice: string };
export type PartRef = { deviceId: string; kind: 'port' | 'group'; index: number };

export type Snapshot = {
  /** The document this snapshot was built from. */
  doc: Topology;
  /** Device boxes in document order (later ones are drawn on top). */
  devices: ReadonlyMap<string, DeviceBox>;
  cables: ReadonlyMap<string, CableLine>;
  /** Port and group ids → their device and index in its shape. */
  parts: ReadonlyMap<string, PartRef>;
  cablesByDevice: ReadonlyMap<string, readonly string[]>;
  /** The union of all device boxes; null for an empty design. */
  bounds: Rect | null;
};

function boxAt(device: Device, position: Point): DeviceBox {
  const shape = deviceShape(device);
  return {
    id: device.id,
    kind: device.kind,
    name: device.name,
    switchRole: device.kind === 'switch' ? device.role : undefined,
    source: device,
    position,
    rect: { x: position.x, y: position.y, width: shape.width, height: shape.height },
    shape,
  };
}

/** A rectangle of a device's shape in world coordinates. */
export function toWorld(box: DeviceBox, rect: Rect): Rect {
  return { x: rect.x + box.position.x, y: rect.y + box.position.y, width: rect.width, height: rect.height };
}

function worldPort(box: DeviceBox, index: number): PortBox {
  const p = box.shape.ports[index];
  return {
    id: p.id,
    deviceId: box.id,
    groupId: p.groupId,
    name: p.name,
    role: p.role,
    connector: p.connector,
    rect: toWorld(box, p.rect),
    target: toWorld(box, p.target),
    anchor: { x: p.anchor.x + box.position.x, y: p.anchor.y + box.position.y },
  };
}

function samePoint(a: Point, b: Point): boolean {
  return a.x === b.x && a.y === b.y;
}

function indexParts(doc: Topology): Map<string, PartRef> {
  const parts = new Map<string, PartRef>();
  for (const device of doc.devices) {
    const shape = deviceShape(device);
    shape.groups.forEach((g, index) => parts.set(g.id, { deviceId: device.id, kind: 'group', index }));
    shape.ports.forEach((p, index) => parts.set(p.id, { deviceId: device.id, kind: 'port', index }));
  }
  return parts;
}

function indexCables(doc: Topology, owners: Snapshot['parts']): Map<string, string[]> {
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

function anchorOf(devices: ReadonlyMap<string, DeviceBox>, ref: PartRef | undefined): Point | null {
  if (!ref || ref.kind !== 'port') return null;
  const box = devices.get(ref.deviceId);
  const local = box?.shape.ports[ref.index];
  return box && local ? { x: local.anchor.x + box.position.x, y: local.anchor.y + box.position.y } : null;
}

function lineFor(cable: Cable, devices: ReadonlyMap<string, DeviceBox>, parts: Snapshot['parts']): CableLine | null {
  const refA = parts.get(cable.a);
  const refB = parts.get(cable.b);
  const a = anchorOf(devices, refA);
  const b = anchorOf(devices, refB);
  if (!a || !b) return null;
  return { id: cable.id, source: cable, a, b, aPort: cable.a, bPort: cable.b, aDevice: refA!.deviceId, bDevice: refB!.deviceId };
}

/** The snapshot of a document, reusing whatever of `previous` is still right. */
export function buildSnapshot(doc: Topology, previous?: Snapshot): Snapshot {
  const sameDevices = previous !== undefined && previous.doc.devices === doc.devices;
  const parts = sameDevices ? previous.parts : indexParts(doc);
  const sameCables = sameDevices && previous.doc.cables === doc.cables;
  const cablesByDevice = sameCables ? previous.cablesByDevice : indexCables(doc, parts);

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
      devices.set(device.id, boxAt(device, position));
    }
  }

  const cables = new Map<string, CableLine>();
  for (const cable of doc.cables) {
    const old = previous?.cables.get(cable.id);
    const keep = old && old.source === cable && reused.has(old.aDevice) && reused.has(old.bDevice);
    const line = keep ? old : lineFor(cable, devices, parts);
    if (line) cables.set(cable.id, line);
  }
  return { doc, devices, cables, parts, cablesByDevice, bounds: boundsOf(devices.values()) };
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
    devices.set(id, boxAt(box.source, { x: position.x, y: position.y }));
    for (const cableId of snapshot.cablesByDevice.get(id) ?? []) touched.add(cableId);
  }
  if (!moved) return snapshot;
  const cables = new Map(snapshot.cables);
  for (const cableId of touched) {
    const line = cables.get(cableId);
    const next = line && lineFor(line.source, devices, snapshot.parts);
    if (next) cables.set(cableId, next);
  }
  return { ...snapshot, devices, cables, bounds: boundsOf(devices.values()) };
}

/** A port in world coordinates, or undefined for an unknown id. */
export function portBox(snapshot: Snapshot, portId: string): PortBox | undefined {
  const ref = snapshot.parts.get(portId);
  const box = ref?.kind === 'port' ? snapshot.devices.get(ref.deviceId) : undefined;
  return box ? worldPort(box, ref!.index) : undefined;
}

/** A controller or card in world coordinates, or undefined for an unknown id. */
export function groupBox(snapshot: Snapshot, groupId: string): GroupBox | undefined {
  const ref = snapshot.parts.get(groupId);
  const box = ref?.kind === 'group' ? snapshot.devices.get(ref.deviceId) : undefined;
  if (!box) return undefined;
  const g = box.shape.groups[ref!.index];
  return { id: g.id, deviceId: box.id, name: g.name, rect: toWorld(box, g.rect) };
}

/** Every port of a device in world coordinates (for overlays; the canvas draws the shape instead). */
export function devicePorts(box: DeviceBox): PortBox[] {
  return box.shape.ports.map((_, index) => worldPort(box, index));
}

/** The world rectangle of whatever an id names: device, controller, card or port (centre a finding on it). */
export function boxOf(snapshot: Snapshot, id: string): Rect | undefined {
  return snapshot.devices.get(id)?.rect ?? portBox(snapshot, id)?.target ?? groupBox(snapshot, id)?.rect;
}

export { boundsOf, resolvePositions };
