import type { GroupKind } from '@/shared/diff/types';
import { displayName, indexTopology, type PortRef, type TopologyIndex } from '@/shared/topology';
import type { Adapter, Controller, Device, Topology } from '@/shared/topology/schema';

/**
 * One version's things, keyed by id, in the shape the section specs compare. Built once per
 * version with the shared topology index, so the whole diff is a few linear passes plus sorting.
 * Ids are unique across a valid document (the schema's validator checks it); on an invalid one the
 * last thing with a repeated id wins, as in the index.
 */
export type GroupItem = { group: Controller | Adapter; kind: GroupKind; device: Device };

export type Collected = {
  index: TopologyIndex;
  groups: Map<string, GroupItem>;
  /** Ports that carry an address, by port id. */
  addressed: Map<string, PortRef>;
};

export function collect(doc: Topology): Collected {
  const index = indexTopology(doc);
  const groups = new Map<string, GroupItem>();
  for (const [id, { controller, array }] of index.controllers) groups.set(id, { group: controller, kind: 'controller', device: array });
  for (const [id, { adapter, host }] of index.adapters) groups.set(id, { group: adapter, kind: 'adapter', device: host });
  const addressed = new Map<string, PortRef>();
  for (const [id, ref] of index.ports) if (ref.port.address) addressed.set(id, ref);
  return { index, groups, addressed };
}

/** "wms-db-1 / card-1": a controller or card named with its device. */
export function groupLabel(item: GroupItem): string {
  return `${displayName(item.device)} / ${displayName(item.group)}`;
}

/** "wms-db-1 / card-1 p1", or "fab-b / p10" for a switch port: how an installer finds the port. */
export function portLabel(ref: PortRef): string {
  const group = ref.adapter ?? ref.controller;
  const device = displayName(ref.device);
  return group ? `${device} / ${displayName(group)} ${displayName(ref.port)}` : `${device} / ${displayName(ref.port)}`;
}

/** A port id as its label in one version; the bare id when that version has no such port. */
export function portIdLabel(side: Collected, portId: string): string {
  const ref = side.index.ports.get(portId);
  return ref ? portLabel(ref) : portId;
}

export function deviceIdName(side: Collected, deviceId: string): string {
  const device = side.index.devices.get(deviceId);
  return device ? displayName(device) : deviceId;
}

export function networkIdName(side: Collected, networkId: string): string {
  const network = side.index.networks.get(networkId);
  return network ? displayName(network) : networkId;
}

export function groupIdName(side: Collected, groupId: string): string {
  const item = side.groups.get(groupId);
  return item ? displayName(item.group) : groupId;
}
