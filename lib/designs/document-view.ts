import { occupiedUnits } from '@/shared/racks/geometry';
import { displayName, indexTopology, otherEnd, portLabel, type TopologyIndex } from '@/shared/topology';
import type { Address, Cable, Device, Port, Topology } from '@/shared/topology/schema';

/**
 * A version's document as the rows of its read-only screen: every value already in words, so the
 * components only lay them out. Pure; tested without React.
 */
export type PortRow = { id: string; name: string; role: string; speed: string; network: string; address: string; cabledTo: string };
export type GroupView = { id: string; title: string; ports: PortRow[] };
export type DeviceView = { id: string; name: string; kind: string; details: string[]; groups: GroupView[] };
export type CableRow = { id: string; label: string; from: string; to: string; media: string; length: string };
export type NetworkRow = { id: string; name: string; purpose: string; cidr: string; vlan: string; mtu: string; gateway: string };

const KIND_WORDS: Record<Device['kind'], string> = { array: 'Storage array', switch: 'Switch', host: 'Host' };
const SWITCH_ROLE_WORDS = { data: 'data switch', management: 'management switch', shared: 'shared data and management switch' };
export const MEDIA_WORDS: Record<Cable['media'], string> = {
  cat5e: 'Cat 5e copper',
  cat6: 'Cat 6 copper',
  cat6a: 'Cat 6A copper',
  om3: 'OM3 multimode fibre',
  om4: 'OM4 multimode fibre',
  dac: 'direct-attach copper',
  aoc: 'active optical cable',
};

export function addressText(address: Address | undefined): string {
  if (!address) return 'none';
  return address.mode === 'dhcp' ? 'DHCP' : address.ip;
}

function portRow(port: Port, index: TopologyIndex): PortRow {
  const cables = index.cablesByPort.get(port.id) ?? [];
  const ends = cables.map((cable) => {
    const ref = index.ports.get(otherEnd(cable, port.id));
    return `${ref ? portLabel(ref) : otherEnd(cable, port.id)} (${cable.label?.trim() || cable.id})`;
  });
  const network = port.networkId ? index.networks.get(port.networkId) : undefined;
  return {
    id: port.id,
    name: displayName(port),
    role: port.role === 'data' ? 'data' : 'management',
    speed: `${port.speedGbps} Gb/s ${port.connector === 'rj45' ? 'RJ45' : 'SFP'}`,
    network: network ? displayName(network) : port.networkId ?? 'none',
    address: addressText(port.address),
    cabledTo: ends.length ? ends.join('; ') : 'not cabled',
  };
}

export function deviceViews(doc: Topology, index: TopologyIndex = indexTopology(doc)): DeviceView[] {
  return doc.devices.map((device) => {
    const details: string[] = [];
    if (device.kind === 'switch') details.push(SWITCH_ROLE_WORDS[device.role]);
    if (device.kind === 'host' && device.iqn) details.push(`initiator ${device.iqn}`);
    const rack = device.placement && doc.racks?.find((r) => r.id === device.placement!.rackId);
    const units = occupiedUnits(device);
    if (rack && units) details.push(`rack ${displayName(rack)}, ${units.top === units.bottom ? `unit ${units.bottom}` : `units ${units.bottom}–${units.top}`}`);
    if (device.kind === 'array' && device.iqn) details.push(`target ${device.iqn}`);
    const groups: GroupView[] =
      device.kind === 'switch'
        ? [{ id: device.id, title: 'Ports', ports: device.ports.map((p) => portRow(p, index)) }]
        : (device.kind === 'array' ? device.controllers : device.adapters).map((group) => ({
            id: group.id,
            title: `${device.kind === 'array' ? 'Controller' : 'Card'} ${displayName(group)}`,
            ports: group.ports.map((p) => portRow(p, index)),
          }));
    return { id: device.id, name: displayName(device), kind: KIND_WORDS[device.kind], details, groups };
  });
}

export function cableRows(doc: Topology, index: TopologyIndex = indexTopology(doc)): CableRow[] {
  const end = (id: string) => {
    const ref = index.ports.get(id);
    return ref ? portLabel(ref) : id;
  };
  return doc.cables.map((cable) => ({
    id: cable.id,
    label: cable.label?.trim() || cable.id,
    from: end(cable.a),
    to: end(cable.b),
    media: MEDIA_WORDS[cable.media],
    length: cable.lengthM === undefined ? 'not measured' : `${cable.lengthM} m`,
  }));
}

export function networkRows(doc: Topology): NetworkRow[] {
  return doc.networks.map((network) => ({
    id: network.id,
    name: displayName(network),
    purpose: network.purpose === 'data' ? 'storage data' : 'management',
    cidr: network.cidr,
    vlan: network.vlan === undefined ? 'not set' : String(network.vlan),
    mtu: network.mtu === undefined ? 'not set' : String(network.mtu),
    gateway: network.gateway ?? 'none',
  }));
}
