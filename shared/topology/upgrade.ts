import type { DeviceV1, TopologyV1 } from '@/shared/topology/format1';
import {
  DEFAULT_DEVICE_HEIGHT_U,
  DEFAULT_RACK_HEIGHT_U,
  TOPOLOGY_FORMAT,
  TOPOLOGY_FORMAT_1,
  type Device,
  type Rack,
  type Topology,
} from '@/shared/topology/schema';

/**
 * Format 1 → format 2, on read (docs/topology-format.md): pure, deterministic, and never written back over
 * a stored version. Each distinct non-empty `rack` text becomes a rack with that name (in order of
 * first use, `heightU` 42); a device with both `rack` and `ru` gets `placement: {rackId, ru,
 * heightU}` with its kind's default height (array 2, switch 1, host 1). Format 1 had no rows,
 * positions, power or target names, so none are made up.
 *
 * Format 2 places a device at a unit of a rack, so a device that had only one of the two loses it:
 * a `rack` without `ru` still makes the rack (it is in the room) but leaves the device unplaced, and
 * an `ru` without `rack` names no rack to be in. Rack ids are made from the name (`rk-a01`) and
 * kept clear of every id already in the document, which must stay unique.
 */
export function upgradeTopology(doc: TopologyV1): Topology {
  const taken = documentIds(doc);
  const racks: Rack[] = [];
  const rackIdByName = new Map<string, string>();
  for (const device of doc.devices) {
    if (!device.rack || rackIdByName.has(device.rack)) continue;
    const rackId = claim(taken, `rk-${slug(device.rack) || 'rack'}`);
    rackIdByName.set(device.rack, rackId);
    racks.push({ id: rackId, name: device.rack, heightU: DEFAULT_RACK_HEIGHT_U });
  }
  return {
    format: TOPOLOGY_FORMAT,
    name: doc.name,
    ...(racks.length > 0 ? { racks } : {}),
    devices: doc.devices.map((device) => upgradeDevice(device, rackIdByName)),
    cables: doc.cables,
    networks: doc.networks,
    ...(doc.security ? { security: doc.security } : {}),
    ...(doc.layout ? { layout: doc.layout } : {}),
  };
}

/** True for a value that says it is a format 1 document (whether or not it is a valid one). */
export function isFormat1(value: unknown): boolean {
  return typeof value === 'object' && value !== null && (value as { format?: unknown }).format === TOPOLOGY_FORMAT_1;
}

function upgradeDevice(device: DeviceV1, rackIdByName: Map<string, string>): Device {
  const { rack, ru, ...rest } = device;
  const rackId = rack ? rackIdByName.get(rack) : undefined;
  if (rackId === undefined || ru === undefined) return rest;
  return { ...rest, placement: { rackId, ru, heightU: DEFAULT_DEVICE_HEIGHT_U[device.kind] } };
}

function documentIds(doc: TopologyV1): Set<string> {
  const ids = new Set<string>();
  for (const device of doc.devices) {
    ids.add(device.id);
    const groups = device.kind === 'array' ? device.controllers : device.kind === 'host' ? device.adapters : [device];
    for (const group of groups) {
      ids.add(group.id);
      for (const port of group.ports) ids.add(port.id);
    }
  }
  for (const cable of doc.cables) ids.add(cable.id);
  for (const network of doc.networks) ids.add(network.id);
  return ids;
}

function claim(taken: Set<string>, base: string): string {
  let candidate = base;
  for (let n = 2; taken.has(candidate); n += 1) candidate = `${base}-${n}`;
  taken.add(candidate);
  return candidate;
}

/** `Row A / 01` → `row-a-01`: the readable part of a rack id. */
function slug(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
}
