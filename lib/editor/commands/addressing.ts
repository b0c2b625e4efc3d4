import { z } from 'zod';
import { assignAddresses } from '@/shared/address/assign';
import type { Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { mapPorts } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';

/**
 * Automatic addressing. Every host and controller port that is on a network and has no address
 * gets a static one from its network: targets (controller ports) the lowest free addresses, hosts
 * a high block (from the middle of the first 256 usable addresses up; the usual convention, common
 * practice), ports taken in document order and networks in list order, so the same design always
 * gets the same plan. The address math is
 * the shared one (shared/address): it never hands out the network or broadcast address, the
 * gateway, or an address any port of the design already has. A network that runs out leaves the
 * remaining ports unaddressed, which the analysis reports.
 */
export type AutoAssignArgs = {
  /** Only ports on these networks. */
  networkIds?: string[];
  /** Only these ports. */
  portIds?: string[];
};

function staticAddresses(doc: Topology): string[] {
  const used: string[] = [];
  for (const device of doc.devices) {
    if (device.kind === 'switch') continue;
    const groups = device.kind === 'array' ? device.controllers : device.adapters;
    for (const group of groups) for (const port of group.ports) if (port.address?.mode === 'static') used.push(port.address.ip);
  }
  return used;
}

function checkNetworks(doc: Topology, ids: string[] | undefined): void {
  for (const id of ids ?? []) {
    if (!doc.networks.some((n) => n.id === id)) throw new CommandError('not-found', `There is no network "${id}" in this design.`, 'networkIds');
  }
}

/** The addresses auto-assign would give, port id → address, without changing anything. */
export function planAddresses(doc: Topology, args: AutoAssignArgs = {}): Map<string, string> {
  checkNetworks(doc, args.networkIds);
  const networks = args.networkIds ? new Set(args.networkIds) : null;
  const only = args.portIds ? new Set(args.portIds) : null;
  const waiting = new Map<string, { targets: string[]; hosts: string[] }>();
  for (const device of doc.devices) {
    if (device.kind === 'switch') continue;
    const groups = device.kind === 'array' ? device.controllers : device.adapters;
    for (const group of groups) {
      for (const port of group.ports) {
        if (!port.networkId || port.address !== undefined) continue;
        if ((networks && !networks.has(port.networkId)) || (only && !only.has(port.id))) continue;
        let lists = waiting.get(port.networkId);
        if (!lists) waiting.set(port.networkId, (lists = { targets: [], hosts: [] }));
        (device.kind === 'array' ? lists.targets : lists.hosts).push(port.id);
      }
    }
  }
  const used = staticAddresses(doc);
  const plan = new Map<string, string>();
  for (const network of doc.networks) {
    const lists = waiting.get(network.id);
    if (!lists) continue;
    for (const [ports, from] of [[lists.targets, 'low'], [lists.hosts, 'high']] as const) {
      const ips = assignAddresses(network.cidr, ports.length, used, { gateway: network.gateway, from });
      ips.forEach((ip, i) => {
        plan.set(ports[i], ip);
        used.push(ip);
      });
    }
  }
  return plan;
}

export function autoAssignAddresses(doc: Topology, args: AutoAssignArgs = {}): Topology {
  const plan = planAddresses(doc, args);
  if (plan.size === 0) return doc;
  return mapPorts(doc, (port) => {
    const ip = plan.get(port.id);
    return ip ? { ...port, address: { mode: 'static', ip } } : port;
  });
}

/** Removes addresses (static or DHCP) from host and controller ports: all, or those of one network or some ports. */
export function clearAddresses(doc: Topology, args: { networkId?: string; portIds?: string[] } = {}): Topology {
  checkNetworks(doc, args.networkId ? [args.networkId] : undefined);
  const only = args.portIds ? new Set(args.portIds) : null;
  return mapPorts(doc, (port) => {
    if (port.address === undefined) return port;
    if (args.networkId && port.networkId !== args.networkId) return port;
    if (only && !only.has(port.id)) return port;
    const { address: _dropped, ...rest } = port;
    return rest;
  });
}

const ids = z.array(z.string().min(1));

export const addressingCommands = [
  command('autoAssignAddresses', 'Give unaddressed ports static addresses from their networks', z.object({ networkIds: ids.optional(), portIds: ids.optional() }).strict(), autoAssignAddresses),
  command('clearAddresses', 'Remove port addresses', z.object({ networkId: z.string().min(1).optional(), portIds: ids.optional() }).strict(), clearAddresses),
];
