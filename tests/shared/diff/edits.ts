import type { Adapter, Controller, Device, Port, Topology } from '@/shared/topology/schema';

/**
 * Random edits for the property tests: each keeps the document valid (references still resolve,
 * ids stay unique), and some change nothing of the design (reorders, a cable turned around, layout)
 * so both answers of "is this diff empty?" come up often.
 */
export const EDIT_KINDS = [
  'rename-device', 'remove-device', 'add-host', 'rack-ru', 'rack-edit', 'iqn', 'switch-role',
  'port-speed', 'port-role', 'port-connector', 'port-network', 'port-move', 'rename-port', 'remove-card', 'rename-card',
  'address-static', 'address-dhcp', 'address-clear',
  'cable-end', 'cable-turn', 'cable-remove', 'cable-add', 'cable-media', 'cable-length', 'cable-label',
  'network-vlan', 'network-mtu', 'network-name', 'network-add', 'network-remove', 'network-gateway',
  'chap', 'doc-name', 'layout', 'reorder',
] as const;
export type Edit = { kind: (typeof EDIT_KINDS)[number]; i: number; j: number };

const groupsOf = (d: Device): (Controller | Adapter)[] => (d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : []);
const portsOf = (d: Device): Port[] => (d.kind === 'switch' ? d.ports : groupsOf(d).flatMap((g) => g.ports));
const allPorts = (doc: Topology) => doc.devices.flatMap(portsOf);
const at = <T>(items: T[], i: number): T | undefined => (items.length ? items[i % items.length] : undefined);

function dropCablesOn(doc: Topology, portIds: Set<string>) {
  doc.cables = doc.cables.filter((c) => !portIds.has(c.a) && !portIds.has(c.b));
}

function editDevices(doc: Topology, { kind, i, j }: Edit): boolean {
  if (kind === 'add-host') return addHost(doc, j);
  const device = at(doc.devices, i);
  if (!device) return false;
  if (kind === 'rename-device') device.name = `${device.name}+`;
  else if (kind === 'remove-device') {
    doc.devices = doc.devices.filter((d) => d !== device);
    dropCablesOn(doc, new Set(portsOf(device).map((p) => p.id)));
    if (doc.layout) delete doc.layout[device.id];
  } else if (kind === 'rack-ru') placeDevice(doc, device, j);
  else if (kind === 'rack-edit') {
    const rack = at(doc.racks ?? [], j);
    if (rack) rack.position = 1 + (i % 9);
  } else if (kind === 'iqn' && device.kind !== 'switch') device.iqn = `iqn.2026-01.example.test:h${j}`;
  else if (kind === 'switch-role' && device.kind === 'switch') device.role = (['data', 'management', 'shared'] as const)[j % 3];
  else if (kind === 'rename-card') { const g = at(groupsOf(device), j); if (g) g.name = `${g.name}+`; }
  else if (kind === 'remove-card' && device.kind === 'host') {
    const card = at(device.adapters, j);
    if (!card) return true;
    device.adapters = device.adapters.filter((a) => a !== card);
    dropCablesOn(doc, new Set(card.ports.map((p) => p.id)));
  } else if (kind === 'port-move' && device.kind === 'host' && device.adapters.length > 1) {
    const from = at(device.adapters, j)!;
    const to = at(device.adapters, j + 1)!;
    const moved = from.ports.pop();
    if (moved) to.ports.push(moved);
  } else if (kind === 'reorder') doc.devices.reverse();
  else return false;
  return true;
}

/** Into rack R0…R6 (added to the room when new) at a unit, moved within its rack, or taken out. */
function placeDevice(doc: Topology, device: Device, j: number): void {
  if (j % 3 === 2) {
    delete device.placement;
    return;
  }
  if (j % 3 === 1 && device.placement) {
    device.placement.ru = 1 + (j % 42);
    return;
  }
  const id = `extra-rack-${j % 7}`;
  doc.racks ??= [];
  if (!doc.racks.some((r) => r.id === id)) doc.racks.push({ id, name: `R${j % 7}`, row: j % 2 ? 'A' : 'B', position: 1 + (j % 5) });
  device.placement = { rackId: id, ru: 1 + (j % 42) };
}

function addHost(doc: Topology, j: number): boolean {
  const id = `extra-${j}`;
  if (doc.devices.some((d) => d.id === id)) return true;
  const port: Port = { id: `${id}.c.p`, name: 'p', role: 'data', speedGbps: 25, connector: 'sfp' };
  doc.devices.push({ id, kind: 'host', name: id, adapters: [{ id: `${id}.c`, name: 'c', ports: [port] }] });
  return true;
}

function editPorts(doc: Topology, { kind, i, j }: Edit): boolean {
  // The format: a switch port carries no network and no address of its own.
  const addressable = kind.startsWith('address') || kind === 'port-network';
  const port = at(addressable ? doc.devices.filter((d) => d.kind !== 'switch').flatMap(portsOf) : allPorts(doc), i);
  if (!port) return false;
  if (kind === 'port-speed') port.speedGbps = ([1, 10, 25, 100] as const)[j % 4];
  else if (kind === 'port-role') port.role = port.role === 'data' ? 'management' : 'data';
  else if (kind === 'port-connector') port.connector = port.connector === 'rj45' ? 'sfp' : 'rj45';
  else if (kind === 'port-network') port.networkId = at(doc.networks, j)?.id;
  else if (kind === 'rename-port') port.name = `${port.name}+`;
  else if (kind === 'address-static') port.address = { mode: 'static', ip: `198.51.100.${j % 256}` }; // RFC 5737
  else if (kind === 'address-dhcp') port.address = { mode: 'dhcp' };
  else if (kind === 'address-clear') delete port.address;
  else return false;
  if (port.networkId === undefined) delete port.networkId;
  return true;
}

function editCables(doc: Topology, { kind, i, j }: Edit): boolean {
  const ports = allPorts(doc);
  if (kind === 'cable-add') {
    const a = at(ports, i);
    const b = at(ports, j);
    if (a && b && a !== b && !doc.cables.some((c) => c.id === `extra-k${i}-${j}`)) doc.cables.push({ id: `extra-k${i}-${j}`, a: a.id, b: b.id, media: 'dac' });
    return true;
  }
  const cable = at(doc.cables, i);
  if (!cable) return false;
  if (kind === 'cable-end') {
    const to = at(ports, j);
    if (to && to.id !== cable.a) cable.b = to.id;
  } else if (kind === 'cable-turn') [cable.a, cable.b] = [cable.b, cable.a];
  else if (kind === 'cable-remove') doc.cables = doc.cables.filter((c) => c !== cable);
  else if (kind === 'cable-media') cable.media = (['cat6', 'cat6a', 'om4', 'dac'] as const)[j % 4];
  else if (kind === 'cable-length') cable.lengthM = 1 + (j % 50);
  else if (kind === 'cable-label') cable.label = `L-${j % 10}`;
  else return false;
  return true;
}

function editNetworks(doc: Topology, { kind, i, j }: Edit): boolean {
  if (kind === 'network-add') {
    const id = `extra-n${j}`;
    if (!doc.networks.some((n) => n.id === id)) doc.networks.push({ id, name: id, purpose: 'management', cidr: '192.0.2.0/24' }); // RFC 5737
    return true;
  }
  const network = at(doc.networks, i);
  if (!network) return false;
  if (kind === 'network-vlan') network.vlan = 1 + (j % 4094);
  else if (kind === 'network-mtu') network.mtu = j % 2 ? 9000 : 1500;
  else if (kind === 'network-name') network.name = `${network.name}+`;
  else if (kind === 'network-gateway') network.gateway = `198.51.100.${j % 256}`;
  else if (kind === 'network-remove') {
    doc.networks = doc.networks.filter((n) => n !== network);
    for (const port of allPorts(doc)) if (port.networkId === network.id) delete port.networkId;
  } else return false;
  return true;
}

function editDocument(doc: Topology, { kind, i, j }: Edit): boolean {
  if (kind === 'chap') doc.security = { chap: (['none', 'one-way', 'mutual'] as const)[j % 3] };
  else if (kind === 'doc-name') doc.name = `${doc.name}+`;
  else if (kind === 'layout') {
    const device = at(doc.devices, i);
    if (device) doc.layout = { ...doc.layout, [device.id]: { x: j, y: i } };
  } else return false;
  return true;
}

export function applyEdits(doc: Topology, edits: Edit[]): Topology {
  const copy = structuredClone(doc);
  for (const edit of edits) editDevices(copy, edit) || editPorts(copy, edit) || editCables(copy, edit) || editNetworks(copy, edit) || editDocument(copy, edit);
  return copy;
}
