import { z } from 'zod';
import { contains } from '@/shared/address/cidr';
import { CHAP_MODES, NETWORK_PURPOSES, networkSchema, type ChapMode, type Network, type NetworkPurpose, type Topology } from '@/shared/topology/schema';
import { autoAssignAddresses } from '@/lib/editor/commands/addressing';
import { command } from '@/lib/editor/commands/define';
import { mapPorts, patch } from '@/lib/editor/commands/doc';
import { CommandError, commandErrorFromZod } from '@/lib/editor/errors';
import { claimId, collectIds, slug } from '@/lib/editor/ids';

/**
 * Networks and design-wide settings. Removing a network takes its ports off it and drops their
 * static addresses that lie inside it (they mean nothing without it); DHCP and addresses outside
 * it stay. Changing a network's CIDR leaves addresses alone unless `readdress` asks for the ports
 * whose addresses no longer fit to be renumbered from the new block.
 */
export type AddNetworkArgs = {
  name: string;
  purpose: NetworkPurpose;
  cidr: string;
  vlan?: number;
  mtu?: number;
  gateway?: string;
  /** By default `net-` and the name (`net-fabric-c`). */
  id?: string;
};

function checked(network: Network): Network {
  const result = networkSchema.safeParse(network);
  if (!result.success) throw commandErrorFromZod(result.error.issues, 'network');
  return network;
}

/** The id `addNetwork` gives a network of this name. */
export function plannedNetworkId(doc: Topology, args: { name: string; id?: string }): string {
  return claimId(collectIds(doc), args.id ?? `net-${slug(args.name) || 'network'}`);
}

export function addNetwork(doc: Topology, args: AddNetworkArgs): Topology {
  const network: Network = { id: plannedNetworkId(doc, args), name: args.name, purpose: args.purpose, cidr: args.cidr.trim() };
  if (args.vlan !== undefined) network.vlan = args.vlan;
  if (args.mtu !== undefined) network.mtu = args.mtu;
  if (args.gateway !== undefined) network.gateway = args.gateway.trim();
  checked(network);
  return { ...doc, networks: [...doc.networks, network] };
}

export type UpdateNetworkArgs = {
  id: string;
  name?: string;
  purpose?: NetworkPurpose;
  cidr?: string;
  vlan?: number | null;
  mtu?: number | null;
  gateway?: string | null;
  readdress?: boolean;
};

export function updateNetwork(doc: Topology, args: UpdateNetworkArgs): Topology {
  const index = doc.networks.findIndex((n) => n.id === args.id);
  if (index < 0) throw new CommandError('not-found', `There is no network "${args.id}" in this design.`, 'id');
  const old = doc.networks[index];
  const next = patch(old, { name: args.name, purpose: args.purpose, cidr: args.cidr?.trim(), vlan: args.vlan, mtu: args.mtu, gateway: args.gateway });
  if (next === old) return doc;
  checked(next);
  const networks = doc.networks.slice();
  networks[index] = next;
  let result: Topology = { ...doc, networks };
  if (args.readdress && next.cidr !== old.cidr) {
    const moved: string[] = [];
    result = mapPorts(result, (port) => {
      if (port.networkId !== next.id || port.address?.mode !== 'static' || contains(next.cidr, port.address.ip)) return port;
      moved.push(port.id);
      const { address: _old, ...rest } = port;
      return rest;
    });
    if (moved.length > 0) result = autoAssignAddresses(result, { portIds: moved });
  }
  return result;
}

export function removeNetwork(doc: Topology, args: { id: string }): Topology {
  const network = doc.networks.find((n) => n.id === args.id);
  if (!network) throw new CommandError('not-found', `There is no network "${args.id}" in this design.`, 'id');
  const without = { ...doc, networks: doc.networks.filter((n) => n.id !== args.id) };
  return mapPorts(without, (port) => {
    if (port.networkId !== args.id) return port;
    const { networkId: _net, address, ...rest } = port;
    const keep = address && !(address.mode === 'static' && contains(network.cidr, address.ip));
    return keep ? { ...rest, address } : rest;
  });
}

export function renameDesign(doc: Topology, args: { name: string }): Topology {
  return doc.name === args.name ? doc : { ...doc, name: args.name };
}

export function setChap(doc: Topology, args: { chap: ChapMode }): Topology {
  return doc.security?.chap === args.chap ? doc : { ...doc, security: { chap: args.chap } };
}

const id = z.string().min(1);
const name = z.string().max(200);
const fields = {
  name,
  purpose: z.enum(NETWORK_PURPOSES),
  cidr: z.string().min(1),
};

export const networkCommands = [
  command(
    'addNetwork',
    'Add a network',
    z.object({ ...fields, vlan: z.number().int().optional(), mtu: z.number().int().optional(), gateway: z.string().min(1).optional(), id: id.max(200).optional() }).strict(),
    addNetwork,
  ),
  command(
    'updateNetwork',
    'Edit a network',
    z
      .object({
        id,
        name: name.optional(),
        purpose: fields.purpose.optional(),
        cidr: fields.cidr.optional(),
        vlan: z.number().int().nullable().optional(),
        mtu: z.number().int().nullable().optional(),
        gateway: z.string().min(1).nullable().optional(),
        readdress: z.boolean().optional(),
      })
      .strict(),
    updateNetwork,
  ),
  command('removeNetwork', 'Remove a network', z.object({ id }).strict(), removeNetwork),
  command('renameDesign', 'Rename the design', z.object({ name }).strict(), renameDesign),
  command('setChap', 'Set the CHAP mode', z.object({ chap: z.enum(CHAP_MODES) }).strict(), setChap),
];
