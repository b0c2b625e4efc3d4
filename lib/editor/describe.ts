import type { Adapter, Cable, Controller, Device, Network, Port, Topology } from '@/shared/topology/schema';
import { groupsOf } from '@/lib/editor/commands/doc';

/**
 * What an id of the working document is, with everything the inspector needs around it, found by
 * plain scans (a few hundred devices at most; the canvas's own lookups stay in the snapshot).
 */
export type Selected =
  | { kind: 'device'; device: Device }
  | { kind: 'group'; group: Controller | Adapter; device: Device }
  | { kind: 'port'; port: Port; device: Device; group?: Controller | Adapter }
  | { kind: 'cable'; cable: Cable }
  | { kind: 'network'; network: Network };

export function describeId(doc: Topology, id: string): Selected | null {
  for (const device of doc.devices) {
    if (device.id === id) return { kind: 'device', device };
    if (device.kind === 'switch') {
      const port = device.ports.find((p) => p.id === id);
      if (port) return { kind: 'port', port, device };
      continue;
    }
    for (const group of groupsOf(device)) {
      if (group.id === id) return { kind: 'group', group, device };
      const port = group.ports.find((p) => p.id === id);
      if (port) return { kind: 'port', port, device, group };
    }
  }
  const cable = doc.cables.find((c) => c.id === id);
  if (cable) return { kind: 'cable', cable };
  const network = doc.networks.find((n) => n.id === id);
  return network ? { kind: 'network', network } : null;
}

/** "wms-db-1 card-1 p1", "fab-a p3": a port as an installer reads it. */
export function portLabel(doc: Topology, portId: string): string {
  const found = describeId(doc, portId);
  if (found?.kind !== 'port') return portId;
  return [found.device.name, found.group?.name, found.port.name].filter(Boolean).join(' ');
}

/** What a subject of a finding is called on screen. */
export function subjectLabel(doc: Topology, id: string): string {
  const found = describeId(doc, id);
  if (!found) return id;
  switch (found.kind) {
    case 'device':
      return found.device.name;
    case 'group':
      return `${found.device.name} ${found.group.name}`;
    case 'port':
      return portLabel(doc, id);
    case 'cable':
      return `cable ${found.cable.label ?? found.cable.id}`;
    case 'network':
      return found.network.name || found.network.id;
  }
}

/** The device an id belongs to (itself for a device), for centring the view on it. */
export function deviceOf(doc: Topology, id: string): string | null {
  const found = describeId(doc, id);
  if (!found) return null;
  if (found.kind === 'device' || found.kind === 'group' || found.kind === 'port') return found.device.id;
  return null;
}

export function cablesOnPort(doc: Topology, portId: string): Cable[] {
  return doc.cables.filter((c) => c.a === portId || c.b === portId);
}

export const KIND_LABEL: Record<Device['kind'], string> = { array: 'Storage array', switch: 'Switch', host: 'Host' };
