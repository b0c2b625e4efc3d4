import { normalizeIp } from '@/shared/address/ip';
import {
  deviceIdName,
  groupIdName,
  groupLabel,
  networkIdName,
  portIdLabel,
  rackIdName,
  feedIdName,
  portLabel,
  type Collected,
  type GroupItem,
  type PortItem,
} from '@/shared/diff/collect';
import type { FieldSpec, SectionSpec } from '@/shared/diff/compare';
import type {
  AddressDiffEntry,
  DeviceDiffEntry,
  DiffEntry,
  DiffValue,
  GroupDiffEntry,
  PortDiffEntry,
} from '@/shared/diff/types';
import { displayName } from '@/shared/topology';
import type { Address, Cable, Device, Network } from '@/shared/topology/schema';

/**
 * What each section compares. Rules that hold throughout: an absent optional field is null;
 * references (a port's network, a cable's ends, a card's device) are compared by id and shown by
 * name, so renaming a switch changes the switch, not every cable on it; addresses are compared as
 * addresses, so "2001:db8::1" and "2001:DB8:0::1" are one value.
 */
type Field<T> = FieldSpec<T, Collected>;

const opt = (value: string | number | undefined): DiffValue => value ?? null;

function sameIp(before: DiffValue, after: DiffValue): boolean {
  if (typeof before !== 'string' || typeof after !== 'string') return false;
  const b = normalizeIp(before);
  return b !== null && b === normalizeIp(after);
}

function sameCidr(before: DiffValue, after: DiffValue): boolean {
  if (typeof before !== 'string' || typeof after !== 'string') return false;
  const [bIp, bPrefix] = before.split('/');
  const [aIp, aPrefix] = after.split('/');
  return bPrefix !== undefined && Number(bPrefix) === Number(aPrefix) && sameIp(bIp, aIp);
}

/** A device's power supplies, compared by ids and names (a feed by its id, so renaming a feed changes the feed only). */
function psuKey(device: Device): DiffValue {
  if (!device.psus?.length) return null;
  return device.psus.map((psu) => `${psu.id}\u0000${psu.name}\u0000${psu.feedId ?? ''}`).join('\u0001');
}

/** …and shown as "PSU 1 (Feed A), PSU 2 (no feed)". */
function psuText(device: Device, side: Collected): DiffValue {
  if (!device.psus?.length) return null;
  return device.psus.map((psu) => `${displayName(psu)} (${psu.feedId === undefined ? 'no feed' : feedIdName(side, psu.feedId)})`).join(', ');
}

export const deviceSection: SectionSpec<Device, Collected, DeviceDiffEntry> = {
  fields: [
    { field: 'name', key: (d) => d.name },
    { field: 'kind', key: (d) => d.kind },
    { field: 'role', key: (d) => (d.kind === 'switch' ? d.role : null) },
    { field: 'rack', key: (d) => opt(d.placement?.rackId), show: (d, side) => (d.placement ? rackIdName(side, d.placement.rackId) : null) },
    { field: 'ru', key: (d) => opt(d.placement?.ru) },
    { field: 'heightU', key: (d) => opt(d.placement?.heightU) },
    { field: 'iqn', key: (d) => (d.kind === 'switch' ? null : opt(d.iqn)) },
    { field: 'psus', key: psuKey, show: psuText },
  ],
  describe: (id, d) => ({ id, name: displayName(d), kind: d.kind }),
};

export const groupSection: SectionSpec<GroupItem, Collected, GroupDiffEntry> = {
  fields: [
    { field: 'name', key: (g) => g.group.name },
    { field: 'kind', key: (g) => g.kind },
    { field: 'device', key: (g) => g.device.id, show: (g) => displayName(g.device) },
    { field: 'iqn', key: (g) => ('iqn' in g.group ? opt(g.group.iqn) : null) },
  ],
  describe: (id, g) => ({ id, name: groupLabel(g), kind: g.kind, device: displayName(g.device) }),
};

const portFields: Field<PortItem>[] = [
  { field: 'name', key: (r) => r.port.name },
  { field: 'role', key: (r) => r.port.role },
  { field: 'speedGbps', key: (r) => r.port.speedGbps },
  { field: 'connector', key: (r) => r.port.connector },
  { field: 'network', key: (r) => opt(r.port.networkId), show: (r, side) => (r.port.networkId ? networkIdName(side, r.port.networkId) : null) },
  // A port that moved to another card or device keeps its id; these say where it went.
  { field: 'device', key: (r) => r.device.id, show: (r, side) => deviceIdName(side, r.device.id) },
  { field: 'group', key: (r) => r.group?.id ?? null, show: (r, side) => (r.group ? groupIdName(side, r.group.id) : null) },
];

export const portSection: SectionSpec<PortItem, Collected, PortDiffEntry> = {
  fields: portFields,
  describe: (id, r) => ({ id, name: portLabel(r), device: displayName(r.device) }),
};

/** An address as one value: the IP text, or "dhcp". */
function addressValue(address: Address | undefined): DiffValue {
  if (!address) return null;
  return address.mode === 'static' ? address.ip : 'dhcp';
}

export const addressSection: SectionSpec<PortItem, Collected, AddressDiffEntry> = {
  fields: [{ field: 'address', key: (r) => addressValue(r.port.address), equal: sameIp }],
  describe: (id, r) => ({ id, name: portLabel(r), device: displayName(r.device) }),
  // Read from the ports map: a port without an address has no address entry.
  present: (r) => r.port.address !== undefined,
};

/** A cable turned end for end is the same cable: line the later ends up with the earlier ones. */
function alignEnds(before: Cable, after: Cable): Cable {
  const swapped = after.a !== before.a && (after.a === before.b || after.b === before.a);
  return swapped ? { ...after, a: after.b, b: after.a } : after;
}

export const cableSection: SectionSpec<Cable, Collected, DiffEntry> = {
  fields: [
    { field: 'a', key: (c) => c.a, show: (c, side) => portIdLabel(side, c.a) },
    { field: 'b', key: (c) => c.b, show: (c, side) => portIdLabel(side, c.b) },
    { field: 'media', key: (c) => c.media },
    { field: 'lengthM', key: (c) => opt(c.lengthM) },
    { field: 'label', key: (c) => opt(c.label) },
  ],
  describe: (id, c) => ({ id, name: c.label?.trim() ? c.label.trim() : id }),
  align: alignEnds,
};

export const networkSection: SectionSpec<Network, Collected, DiffEntry> = {
  fields: [
    { field: 'name', key: (n) => n.name },
    { field: 'purpose', key: (n) => n.purpose },
    { field: 'cidr', key: (n) => n.cidr, equal: sameCidr },
    { field: 'vlan', key: (n) => opt(n.vlan) },
    { field: 'mtu', key: (n) => opt(n.mtu) },
    { field: 'gateway', key: (n) => opt(n.gateway), equal: sameIp },
  ],
  describe: (id, n) => ({ id, name: displayName(n) }),
};
