import { indexTopology, displayName, type TopologyIndex } from '@/shared/topology';
import type { DeviceKind, Topology } from '@/shared/topology/schema';
import type { ScheduleRow } from '@/shared/schedule/types';

/**
 * What the cable detail draws: the two devices a cable joins, each with all its ports in their
 * controllers or cards, and the one port the cable plugs into marked. Our own shapes: a device is a
 * front panel, a port a small square, and the cable a line between the two marked ports.
 */
export type DrawnPort = { id: string; name: string; lit: boolean };
export type DrawnGroup = { name: string | null; ports: DrawnPort[] };
export type DrawnDevice = { deviceId: string; name: string; kind: DeviceKind; groups: DrawnGroup[] };
export type CableDrawingModel = { near: DrawnDevice; far: DrawnDevice };

/** "Controller" on an array, "Card" on a host, nothing on a switch (its ports sit on the chassis). */
export function partWord(kind: DeviceKind | null): string {
  if (kind === 'array') return 'Controller';
  if (kind === 'host') return 'Card';
  if (kind === 'switch') return 'Part';
  return 'Controller or card';
}

function drawDevice(index: TopologyIndex, deviceId: string, litPortId: string): DrawnDevice | null {
  const device = index.devices.get(deviceId);
  if (!device) return null;
  const lit = (id: string) => id === litPortId;
  const ports = (list: readonly { id: string; name: string }[]) => list.map((p) => ({ id: p.id, name: displayName(p), lit: lit(p.id) }));
  let groups: DrawnGroup[];
  if (device.kind === 'array') groups = device.controllers.map((c) => ({ name: displayName(c), ports: ports(c.ports) }));
  else if (device.kind === 'host') groups = device.adapters.map((a) => ({ name: displayName(a), ports: ports(a.ports) }));
  else groups = [{ name: null, ports: ports(device.ports) }];
  return { deviceId: device.id, name: displayName(device), kind: device.kind, groups };
}

/**
 * The drawing of one schedule row: the row's near end is the cable's end on `row.a.deviceId`
 * (the schedule may have swapped the cable's own a/b). Null when the document does not hold the
 * cable or one of its ports (a document and a schedule of different versions).
 */
export function cableDrawing(doc: Topology, row: ScheduleRow, index: TopologyIndex = indexTopology(doc)): CableDrawingModel | null {
  const cable = index.cables.get(row.id);
  if (!cable) return null;
  const refA = index.ports.get(cable.a);
  const refB = index.ports.get(cable.b);
  if (!refA || !refB) return null;
  const swapped = refA.device.id !== row.a.deviceId && refB.device.id === row.a.deviceId;
  const [nearPort, farPort] = swapped ? [refB, refA] : [refA, refB];
  const near = drawDevice(index, nearPort.device.id, nearPort.port.id);
  const far = drawDevice(index, farPort.device.id, farPort.port.id);
  return near && far ? { near, far } : null;
}

/** The kind of each end's device, for naming its part ("Controller", "Card"); null when unknown. */
export function endKinds(index: TopologyIndex | null, row: ScheduleRow): { a: DeviceKind | null; b: DeviceKind | null } {
  return {
    a: index?.devices.get(row.a.deviceId)?.kind ?? null,
    b: index?.devices.get(row.b.deviceId)?.kind ?? null,
  };
}
