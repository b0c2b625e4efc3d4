import type { GroupKind } from '@/shared/diff/types';
import { displayName } from '@/shared/topology';
import type { Adapter, Cable, Controller, Device, Network, Port, PowerFeed, Rack, Topology } from '@/shared/topology/schema';

/**
 * One version's things, keyed by id, in the shape the section specs compare. One pass over the
 * document with no per-port strings built (the shared topology index also makes document paths and
 * cable-by-port lists, which a diff of 100,000 ports does not need). Ids are unique across a valid
 * document (the validator checks it); on an invalid one the last thing with a repeated id wins.
 */
export type GroupItem = { group: Controller | Adapter; kind: GroupKind; device: Device };
export type PortItem = { port: Port; device: Device; group?: Controller | Adapter };

export type Collected = {
  devices: Map<string, Device>;
  groups: Map<string, GroupItem>;
  ports: Map<string, PortItem>;
  cables: Map<string, Cable>;
  networks: Map<string, Network>;
  racks: Map<string, Rack>;
  feeds: Map<string, PowerFeed>;
};

function addPorts(into: Collected, ports: Port[], device: Device, group?: Controller | Adapter) {
  for (const port of ports) {
    into.ports.set(port.id, { port, device, group });
  }
}

export function collect(doc: Topology): Collected {
  const into: Collected = { devices: new Map(), groups: new Map(), ports: new Map(), cables: new Map(), networks: new Map(), racks: new Map(), feeds: new Map() };
  for (const rack of doc.racks ?? []) into.racks.set(rack.id, rack);
  for (const feed of doc.powerFeeds ?? []) into.feeds.set(feed.id, feed);
  for (const device of doc.devices) {
    into.devices.set(device.id, device);
    if (device.kind === 'switch') {
      addPorts(into, device.ports, device);
      continue;
    }
    const groups = device.kind === 'array' ? device.controllers : device.adapters;
    const kind: GroupKind = device.kind === 'array' ? 'controller' : 'adapter';
    for (const group of groups) {
      into.groups.set(group.id, { group, kind, device });
      addPorts(into, group.ports, device, group);
    }
  }
  for (const cable of doc.cables) into.cables.set(cable.id, cable);
  for (const network of doc.networks) into.networks.set(network.id, network);
  return into;
}

/** "wms-db-1 / card-1": a controller or card named with its device. */
export function groupLabel(item: GroupItem): string {
  return `${displayName(item.device)} / ${displayName(item.group)}`;
}

/** "wms-db-1 / card-1 p1", or "fab-b / p10" for a switch port: how an installer finds the port. */
export function portLabel(ref: PortItem): string {
  const group = ref.group;
  const device = displayName(ref.device);
  return group ? `${device} / ${displayName(group)} ${displayName(ref.port)}` : `${device} / ${displayName(ref.port)}`;
}

/** A port id as its label in one version; the bare id when that version has no such port. */
export function portIdLabel(side: Collected, portId: string): string {
  const ref = side.ports.get(portId);
  return ref ? portLabel(ref) : portId;
}

export function deviceIdName(side: Collected, deviceId: string): string {
  const device = side.devices.get(deviceId);
  return device ? displayName(device) : deviceId;
}

export function networkIdName(side: Collected, networkId: string): string {
  const network = side.networks.get(networkId);
  return network ? displayName(network) : networkId;
}

export function rackIdName(side: Collected, rackId: string): string {
  const rack = side.racks.get(rackId);
  return rack ? displayName(rack) : rackId;
}

export function feedIdName(side: Collected, feedId: string): string {
  const feed = side.feeds.get(feedId);
  return feed ? displayName(feed) : feedId;
}

export function groupIdName(side: Collected, groupId: string): string {
  const item = side.groups.get(groupId);
  return item ? displayName(item.group) : groupId;
}
