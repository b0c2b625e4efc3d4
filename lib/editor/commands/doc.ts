import { withoutPositions } from '@/shared/topology/layout';
import type { Adapter, Controller, Device, Port, Topology } from '@/shared/topology/schema';
import { CommandError } from '@/lib/editor/errors';

/**
 * Immutable update helpers the commands share. They copy only what changes — an untouched device,
 * card or port keeps its object identity — so a command on a 300-device design copies a handful of
 * objects, and the canvas can skip redrawing everything whose identity did not change.
 */
export type PartKind = 'device' | 'controller' | 'adapter' | 'port' | 'cable' | 'network';

export function portsOf(device: Device): Port[] {
  if (device.kind === 'switch') return device.ports;
  const groups: (Controller | Adapter)[] = device.kind === 'array' ? device.controllers : device.adapters;
  return groups.flatMap((g) => g.ports);
}

export function groupsOf(device: Device): (Controller | Adapter)[] {
  if (device.kind === 'array') return device.controllers;
  if (device.kind === 'host') return device.adapters;
  return [];
}

export function deviceById(doc: Topology, id: string): Device {
  const device = doc.devices.find((d) => d.id === id);
  if (!device) throw new CommandError('not-found', `There is no device "${id}" in this design.`, 'id');
  return device;
}

/** What kind of thing an id names, or undefined when the document has no such id. */
export function kindOf(doc: Topology, id: string): PartKind | undefined {
  for (const device of doc.devices) {
    if (device.id === id) return 'device';
    if (device.kind === 'array' && device.controllers.some((c) => c.id === id)) return 'controller';
    if (device.kind === 'host' && device.adapters.some((a) => a.id === id)) return 'adapter';
    if (portsOf(device).some((p) => p.id === id)) return 'port';
  }
  if (doc.cables.some((c) => c.id === id)) return 'cable';
  if (doc.networks.some((n) => n.id === id)) return 'network';
  return undefined;
}

/** The port and the device holding it; throws a readable refusal for an unknown id. */
export function portById(doc: Topology, id: string, path = 'id'): { port: Port; device: Device } {
  for (const device of doc.devices) {
    const port = portsOf(device).find((p) => p.id === id);
    if (port) return { port, device };
  }
  throw new CommandError('not-found', `There is no port "${id}" in this design.`, path);
}

export function replaceDevice(doc: Topology, id: string, update: (device: Device) => Device): Topology {
  const index = doc.devices.findIndex((device) => device.id === id);
  if (index < 0) throw new CommandError('not-found', `There is no device "${id}" in this design.`, 'id');
  const next = update(doc.devices[index]);
  if (next === doc.devices[index]) return doc;
  const devices = doc.devices.slice();
  devices[index] = next;
  return { ...doc, devices };
}

function mapPortList(ports: Port[], fn: PortUpdate, device: Device): Port[] {
  let changed = false;
  const next: Port[] = [];
  for (const port of ports) {
    const result = fn(port, device);
    if (result !== port) changed = true;
    if (result) next.push(result);
  }
  return changed ? next : ports;
}

/** Returns the port (unchanged or a copy), or null to remove it. */
export type PortUpdate = (port: Port, device: Device) => Port | null;

function mapDevicePorts(device: Device, fn: PortUpdate): Device {
  if (device.kind === 'switch') {
    const ports = mapPortList(device.ports, fn, device);
    return ports === device.ports ? device : { ...device, ports };
  }
  const groups = groupsOf(device);
  let changed = false;
  const next = groups.map((group) => {
    const ports = mapPortList(group.ports, fn, device);
    if (ports === group.ports) return group;
    changed = true;
    return { ...group, ports };
  });
  if (!changed) return device;
  return device.kind === 'array' ? { ...device, controllers: next } : { ...device, adapters: next };
}

/** Applies `fn` to every port of the document, copying only the devices whose ports changed. */
export function mapPorts(doc: Topology, fn: PortUpdate): Topology {
  let changed = false;
  const devices = doc.devices.map((device) => {
    const next = mapDevicePorts(device, fn);
    if (next !== device) changed = true;
    return next;
  });
  return changed ? { ...doc, devices } : doc;
}

/** Drops every cable with an end on one of the ports. */
export function removeCablesAt(doc: Topology, portIds: ReadonlySet<string>): Topology {
  if (portIds.size === 0) return doc;
  const cables = doc.cables.filter((c) => !portIds.has(c.a) && !portIds.has(c.b));
  return cables.length === doc.cables.length ? doc : { ...doc, cables };
}

export function removeLayout(doc: Topology, deviceIds: ReadonlySet<string>): Topology {
  if (!doc.layout || !Object.keys(doc.layout).some((id) => deviceIds.has(id))) return doc;
  return { ...doc, layout: withoutPositions(doc.layout, deviceIds) };
}

/** Equal for the plain values commands set (numbers, strings, small address objects). */
function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  return JSON.stringify(a) === JSON.stringify(b);
}

/** A copy of `object` without the keys whose new value is null; undefined keeps the old value; the same object when nothing changes. */
export function patch<T extends object>(object: T, changes: Record<string, unknown>): T {
  const before = object as Record<string, unknown>;
  const next: Record<string, unknown> = { ...before };
  let changed = false;
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined) continue;
    if (value === null) {
      if (key in next) changed = true;
      delete next[key];
    } else if (!sameValue(before[key], value)) {
      next[key] = value;
      changed = true;
    }
  }
  return changed ? (next as T) : object;
}

type Group = Controller | Adapter;

/** Applies `fn` to every controller and card; null removes the group. Copies only what changed. */
export function mapGroups(doc: Topology, fn: (group: Group, device: Device) => Group | null): Topology {
  let changed = false;
  const devices = doc.devices.map((device) => {
    if (device.kind === 'switch') return device;
    const groups = groupsOf(device);
    const next: Group[] = [];
    let touched = false;
    for (const group of groups) {
      const result = fn(group, device);
      if (result !== group) touched = true;
      if (result) next.push(result);
    }
    if (!touched) return device;
    changed = true;
    return device.kind === 'array' ? { ...device, controllers: next } : { ...device, adapters: next };
  });
  return changed ? { ...doc, devices } : doc;
}
