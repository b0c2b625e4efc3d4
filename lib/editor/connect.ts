import type { Device, Network, Port, Topology } from '@/shared/topology/schema';
import { indexTopology, iteratePorts, type PortRef } from '@/shared/topology/index';

/**
 * The other ends a port can be cabled to, for "Connect to…" and the port lists: free ports of other
 * devices, grouped by device, the most fitting first. A candidate is ranked by what would be wrong
 * with the cable, each mismatch weighted by how bad it is:
 *   connector (16) — an RJ45 port and an SFP cage: no cable plugs into both
 *   path (12)      — host to host or controller to controller: no storage path runs over it
 *   role (8)       — a data port on a management switch, a management port on a data switch, or a
 *                    data port to a management port: management and data are kept apart
 *   network (2)    — the ends are on different networks, or the switch already carries other
 *                    networks and not this port's (the host and the target would not pair)
 *   speed (1)      — the link runs at the slower end's speed
 * Fewest points first; equal candidates keep the document's order, so a switch's ports read p1, p2…
 * Devices come in the order of their best port. Ports already cabled are left out: "Connect to…"
 * never doubles a cable by accident.
 */
export type Mismatch = 'connector' | 'path' | 'role' | 'network' | 'speed';
const WEIGHT: Record<Mismatch, number> = { connector: 16, path: 12, role: 8, network: 2, speed: 1 };

export type PortChoice = {
  portId: string;
  deviceId: string;
  /** "card-2 p1", "ctl-a p3", "p10". */
  label: string;
  network: string | null;
  /** Why the cable would not be right, in a few words each; empty for a fitting port. */
  notes: string[];
  mismatches: Mismatch[];
  weight: number;
};
export type DeviceChoices = { deviceId: string; device: string; kind: Device['kind']; ports: PortChoice[]; best: number };

function endKind(ref: PortRef): 'host' | 'controller' | 'switch' {
  return ref.device.kind === 'switch' ? 'switch' : ref.device.kind === 'array' ? 'controller' : 'host';
}

/** The networks of the host and controller ports already cabled to each switch. */
export function switchNetworks(doc: Topology): Map<string, Set<string>> {
  const index = indexTopology(doc);
  const carried = new Map<string, Set<string>>();
  for (const cable of doc.cables) {
    const a = index.ports.get(cable.a);
    const b = index.ports.get(cable.b);
    for (const [sw, end] of [[a, b], [b, a]] as const) {
      if (sw?.device.kind !== 'switch' || !end || end.device.kind === 'switch' || !end.port.networkId) continue;
      let set = carried.get(sw.device.id);
      if (!set) carried.set(sw.device.id, (set = new Set()));
      set.add(end.port.networkId);
    }
  }
  return carried;
}

function roleFits(from: PortRef, to: PortRef): boolean {
  const sw = from.device.kind === 'switch' ? from.device : to.device.kind === 'switch' ? to.device : null;
  if (sw && from.device.kind === 'switch' && to.device.kind === 'switch') {
    // Two switches: fine unless one carries management only and the other data.
    return (from.device.role === 'management') === (to.device.role === 'management') || from.device.role === 'shared' || to.device.role === 'shared';
  }
  if (sw) {
    const port = sw === from.device ? to.port : from.port;
    return sw.role === 'shared' || (sw.role === 'management') === (port.role === 'management');
  }
  return from.port.role === to.port.role;
}

function networkFits(from: PortRef, to: PortRef, carried: Map<string, Set<string>>): boolean {
  const own = (ref: PortRef) => ref.port.networkId;
  if (from.device.kind !== 'switch' && to.device.kind !== 'switch') return !own(from) || !own(to) || own(from) === own(to);
  const [sw, end] = from.device.kind === 'switch' ? [from, to] : [to, from];
  if (end.device.kind === 'switch' || !own(end)) return true;
  const networks = carried.get(sw.device.id);
  return !networks || networks.size === 0 || networks.has(own(end)!);
}

/** What would be wrong with a cable from `from` to `to`. */
export function mismatchesOf(from: PortRef, to: PortRef, carried: Map<string, Set<string>>): Mismatch[] {
  const out: Mismatch[] = [];
  if (from.port.connector !== to.port.connector) out.push('connector');
  const kinds = [endKind(from), endKind(to)];
  if (kinds[0] === kinds[1] && kinds[0] !== 'switch') out.push('path');
  if (!roleFits(from, to)) out.push('role');
  if (!networkFits(from, to, carried)) out.push('network');
  if (from.port.speedGbps !== to.port.speedGbps) out.push('speed');
  return out;
}

function noteFor(mismatch: Mismatch, to: PortRef): string {
  switch (mismatch) {
    case 'connector':
      return to.port.connector === 'sfp' ? 'SFP, not RJ45' : 'RJ45, not SFP';
    case 'path':
      return to.device.kind === 'host' ? 'host to host: no storage path' : 'controller to controller: no storage path';
    case 'role':
      if (to.device.kind === 'switch') return `${to.device.role} switch`;
      return `${to.port.role} port`;
    case 'network':
      return to.device.kind === 'switch' ? 'not on this network' : 'another network';
    case 'speed':
      return `${to.port.speedGbps}G`;
  }
}

function partLabel(ref: PortRef): string {
  const group = ref.controller ?? ref.adapter;
  return group ? `${group.name} ${ref.port.name}` : ref.port.name;
}

/** Every word of the query must appear in the device, part, port or network name (any case). */
function matcher(query: string): (text: string) => boolean {
  const words = query.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return (text) => {
    const hay = text.toLowerCase();
    return words.every((w) => hay.includes(w));
  };
}

/** A port's network in words; a switch port carries whatever its switch's cabled ports are on. */
function networkWords(ref: PortRef, carried: Map<string, Set<string>>, networks: Map<string, Network>): string | null {
  const name = (id: string) => networks.get(id)?.name || id;
  if (ref.device.kind === 'switch') {
    const on = [...(carried.get(ref.device.id) ?? [])].map(name);
    return on.length > 0 ? `switch carries ${on.join(', ')}` : 'switch carries no network yet';
  }
  return ref.port.networkId ? name(ref.port.networkId) : null;
}

export function choiceFor(from: PortRef, to: PortRef, carried: Map<string, Set<string>>, networks: Map<string, Network>): PortChoice {
  const mismatches = mismatchesOf(from, to, carried);
  const network = networkWords(to, carried, networks);
  return {
    portId: to.port.id,
    deviceId: to.device.id,
    label: partLabel(to),
    network,
    notes: mismatches.map((m) => noteFor(m, to)),
    mismatches,
    weight: mismatches.reduce((sum, m) => sum + WEIGHT[m], 0),
  };
}

/** The free ports `fromId` may be cabled to, grouped by device, best first; filtered by `query`. */
export function connectChoices(doc: Topology, fromId: string, query = ''): DeviceChoices[] {
  const index = indexTopology(doc);
  const from = index.ports.get(fromId);
  if (!from) return [];
  const carried = switchNetworks(doc);
  const matches = matcher(query);
  const groups = new Map<string, DeviceChoices>();
  let order = 0;
  const orderOf = new Map<string, number>();
  for (const ref of iteratePorts(doc)) {
    if (ref.device.id === from.device.id || index.cablesByPort.has(ref.port.id)) continue;
    const choice = choiceFor(from, ref, carried, index.networks);
    if (query && !matches(`${ref.device.name} ${choice.label} ${choice.network ?? ''}`)) continue;
    let group = groups.get(ref.device.id);
    if (!group) {
      groups.set(ref.device.id, (group = { deviceId: ref.device.id, device: ref.device.name, kind: ref.device.kind, ports: [], best: Infinity }));
      orderOf.set(ref.device.id, order++);
    }
    group.ports.push(choice);
    group.best = Math.min(group.best, choice.weight);
  }
  const list = [...groups.values()];
  for (const group of list) group.ports = group.ports.map((p, i) => ({ p, i })).sort((x, y) => x.p.weight - y.p.weight || x.i - y.i).map(({ p }) => p);
  return list.sort((x, y) => x.best - y.best || orderOf.get(x.deviceId)! - orderOf.get(y.deviceId)!);
}

export type DevicePort = { portId: string; label: string; network: string | null; role: Port['role']; cabledTo: string | null; choice: PortChoice | null };

/**
 * Every port of one device for the port list a tap opens when ports are drawn too small to hit:
 * where each is cabled now and, while a cable is being drawn from another device, how it fits.
 */
export function devicePorts(doc: Topology, deviceId: string, fromId: string | null = null): DevicePort[] {
  const index = indexTopology(doc);
  const from = fromId ? index.ports.get(fromId) : undefined;
  const carried = switchNetworks(doc);
  const out: DevicePort[] = [];
  for (const ref of iteratePorts(doc)) {
    if (ref.device.id !== deviceId) continue;
    const cable = index.cablesByPort.get(ref.port.id)?.[0];
    const other = cable ? index.ports.get(cable.a === ref.port.id ? cable.b : cable.a) : undefined;
    out.push({
      portId: ref.port.id,
      label: partLabel(ref),
      network: networkWords(ref, carried, index.networks),
      role: ref.port.role,
      cabledTo: other ? `${other.device.name} ${partLabel(other)}` : null,
      choice: from && from.device.id !== deviceId && !cable ? choiceFor(from, ref, carried, index.networks) : null,
    });
  }
  return out;
}
