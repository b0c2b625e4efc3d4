import { parseIp } from '@/shared/address/ip';
import { unitsText } from '@/shared/racks/geometry';
import { displayName, type PortRef } from '@/shared/topology/index';
import type { Device, Network, Rack } from '@/shared/topology/schema';

/** Sentences and fragments the bring-up steps are written with. */

/** The well-known iSCSI TCP port (RFC 7143 §15). */
export const ISCSI_PORT = 3260;

/** `198.51.100.1:3260`; an IPv6 address in brackets, `[2001:db8::1]:3260` (RFC 3986 §3.2.2). */
export function portalText(ip: string): string {
  return parseIp(ip)?.family === 'ipv6' ? `[${ip}]:${ISCSI_PORT}` : `${ip}:${ISCSI_PORT}`;
}

/** "wms-db-1 card-1 p1": a port named by its owners, as its device shows it. */
export function portName(ref: PortRef): string {
  const group = ref.adapter ?? ref.controller;
  return group ? `${displayName(group)} ${displayName(ref.port)}` : displayName(ref.port);
}

/** "198.51.100.5/24 on fabric A, VLAN 110, MTU 9000" — what a data or management port is to be set to. */
export function portSettingsText(ref: PortRef, network: Network | undefined): string {
  const address = ref.port.address;
  const prefix = network ? network.cidr.slice(network.cidr.indexOf('/')) : '';
  const where = !address ? 'no address in the design' : address.mode === 'dhcp' ? 'address from DHCP' : `${address.ip}${prefix}`;
  if (!network) return `${where}, on no network in the design`;
  const vlan = network.vlan === undefined ? 'no VLAN set' : `VLAN ${network.vlan}`;
  const mtu = network.mtu === undefined ? 'MTU not set' : `MTU ${network.mtu}`;
  return `${where} on ${displayName(network)}, ${vlan}, ${mtu}`;
}

/** "rack A01, U12–U13", or "not placed in a rack". */
export function placeText(device: Device, racks: ReadonlyMap<string, Rack>): string {
  const rack = device.placement ? racks.get(device.placement.rackId) : undefined;
  return rack ? `rack ${displayName(rack)}, ${unitsText(device)}` : 'not placed in a rack';
}

/** "a, b and c". */
export function listText(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
