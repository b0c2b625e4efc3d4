import { z } from 'zod';
import { contains } from '@/shared/address/cidr';
import {
  addressSchema,
  CONNECTORS,
  PORT_ROLES,
  PORT_SPEEDS,
  type Address,
  type Connector,
  type Port,
  type PortRole,
  type PortSpeed,
  type Topology,
} from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { deviceById, kindOf, mapGroups, mapPorts, patch, portById, removeCablesAt, replaceDevice } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';
import { collectIds } from '@/lib/editor/ids';
import { makeCard, makeController, makePort } from '@/lib/editor/templates';

/**
 * Controllers, cards and ports: adding and removing them (removing takes their cables along) and
 * setting a port's role, speed, connector, network and address. New parts copy the speed and
 * connector of their siblings, because one card or controller has one kind of port.
 */
const speed = z.union(PORT_SPEEDS.map((s) => z.literal(s)));
type PortKind = { speedGbps?: PortSpeed; connector?: Connector };

export type AddControllerArgs = { arrayId: string; dataPorts?: number; managementPort?: boolean } & PortKind;

export function addController(doc: Topology, args: AddControllerArgs): Topology {
  const array = deviceById(doc, args.arrayId);
  if (array.kind !== 'array') throw new CommandError('wrong-kind', 'Controllers belong to arrays.', 'arrayId');
  if (array.controllers.length >= 4) throw new CommandError('refused', 'An array has at most four controllers.', 'arrayId');
  const model = array.controllers[0];
  const dataModel = model.ports.find((p) => p.role === 'data');
  const options = {
    controllers: 1,
    dataPorts: args.dataPorts ?? model.ports.filter((p) => p.role === 'data').length,
    speedGbps: args.speedGbps ?? dataModel?.speedGbps ?? 10,
    connector: args.connector ?? dataModel?.connector ?? 'rj45',
    managementPort: args.managementPort ?? model.ports.some((p) => p.role === 'management'),
  };
  // The first free letter, so removing ctl-b and adding again gives ctl-b back.
  const names = new Set(array.controllers.map((c) => c.name));
  let index = 0;
  while (names.has(`ctl-${String.fromCharCode(97 + index)}`)) index += 1;
  const controller = makeController(collectIds(doc), array.id, index, options);
  return replaceDevice(doc, array.id, (d) => (d.kind === 'array' ? { ...d, controllers: [...d.controllers, controller] } : d));
}

/** Drops one controller or card and every cable on the ports it held. */
function removeGroup(doc: Topology, id: string, ports: Port[]): Topology {
  const without = mapGroups(doc, (g) => (g.id === id ? null : g));
  return removeCablesAt(without, new Set(ports.map((p) => p.id)));
}

export function removeController(doc: Topology, args: { id: string }): Topology {
  const array = doc.devices.find((d) => d.kind === 'array' && d.controllers.some((c) => c.id === args.id));
  if (!array || array.kind !== 'array') throw new CommandError('not-found', `There is no controller "${args.id}" in this design.`, 'id');
  if (array.controllers.length === 1) throw new CommandError('refused', 'An array keeps at least one controller; delete the array instead.', 'id');
  const controller = array.controllers.find((c) => c.id === args.id)!;
  return removeGroup(doc, args.id, controller.ports);
}

export type AddAdapterArgs = { hostId: string; ports?: number } & PortKind;

export function addAdapter(doc: Topology, args: AddAdapterArgs): Topology {
  const host = deviceById(doc, args.hostId);
  if (host.kind !== 'host') throw new CommandError('wrong-kind', 'Cards belong to hosts.', 'hostId');
  // The onboard management group is not a model for a storage card.
  const model = host.adapters.find((a) => a.ports.some((p) => p.role === 'data'));
  const names = new Set(host.adapters.map((a) => a.name));
  let number = 1;
  while (names.has(`card-${number}`)) number += 1;
  const card = makeCard(collectIds(doc), host.id, number, {
    portsPerCard: args.ports ?? model?.ports.length ?? 2,
    speedGbps: args.speedGbps ?? model?.ports[0]?.speedGbps ?? 10,
    connector: args.connector ?? model?.ports[0]?.connector ?? 'rj45',
  });
  // Cards go before a trailing management-only group, so "onboard" stays last as drawn.
  const last = host.adapters[host.adapters.length - 1];
  const managementOnly = last !== undefined && last.ports.length > 0 && last.ports.every((p) => p.role === 'management');
  const adapters = managementOnly ? [...host.adapters.slice(0, -1), card, last] : [...host.adapters, card];
  return replaceDevice(doc, host.id, (d) => (d.kind === 'host' ? { ...d, adapters } : d));
}

export function removeAdapter(doc: Topology, args: { id: string }): Topology {
  const host = doc.devices.find((d) => d.kind === 'host' && d.adapters.some((a) => a.id === args.id));
  if (!host || host.kind !== 'host') throw new CommandError('not-found', `There is no card "${args.id}" in this design.`, 'id');
  const adapter = host.adapters.find((a) => a.id === args.id)!;
  return removeGroup(doc, args.id, adapter.ports);
}

export type AddPortArgs = { ownerId: string; role?: PortRole; name?: string } & PortKind;

/** Adds a port to a switch, a controller or a card. */
export function addPort(doc: Topology, args: AddPortArgs): Topology {
  const kind = kindOf(doc, args.ownerId);
  if (kind !== 'device' && kind !== 'controller' && kind !== 'adapter') {
    throw new CommandError(kind ? 'wrong-kind' : 'not-found', 'Ports are added to a switch, a controller or a card.', 'ownerId');
  }
  // A new port copies the last sibling of its role (a data port must not copy a 1G management port).
  const build = (siblings: Port[], defaultRole: PortRole): Port[] => {
    const role = args.role ?? defaultRole;
    const model = [...siblings].reverse().find((p) => p.role === role) ?? siblings[siblings.length - 1];
    const names = new Set(siblings.map((p) => p.name));
    let n = 1;
    while (names.has(`p${n}`)) n += 1;
    const port = makePort(collectIds(doc), args.ownerId, {
      name: args.name ?? `p${n}`,
      role,
      speedGbps: args.speedGbps ?? model?.speedGbps ?? 10,
      connector: args.connector ?? model?.connector ?? 'rj45',
    });
    // Data ports go before trailing management ports, so `mgmt` stays drawn last.
    let at = siblings.length;
    if (role === 'data') while (at > 0 && siblings[at - 1].role === 'management') at -= 1;
    return [...siblings.slice(0, at), port, ...siblings.slice(at)];
  };
  if (kind === 'device') {
    const device = deviceById(doc, args.ownerId);
    if (device.kind !== 'switch') throw new CommandError('wrong-kind', 'Add ports to one of its controllers or cards, not to the device itself.', 'ownerId');
    const ports = build(device.ports, device.role === 'management' ? 'management' : 'data');
    return replaceDevice(doc, device.id, (d) => (d.kind === 'switch' ? { ...d, ports } : d));
  }
  return mapGroups(doc, (g) => (g.id === args.ownerId ? { ...g, ports: build(g.ports, 'data') } : g));
}

export function removePort(doc: Topology, args: { id: string }): Topology {
  portById(doc, args.id);
  const without = mapPorts(doc, (p) => (p.id === args.id ? null : p));
  return removeCablesAt(without, new Set([args.id]));
}

export type SetPortArgs = {
  id: string;
  name?: string;
  role?: PortRole;
  speedGbps?: PortSpeed;
  connector?: Connector;
  /** null takes the port off its network. Never on a switch port. */
  networkId?: string | null;
  /** null removes the address. Never on a switch port. */
  address?: Address | null;
};

/**
 * Edits one port. Moving a port to another network drops a static address that lies outside the
 * new network (it cannot be right there, and auto-assign then fills it in), unless the same call
 * sets an address.
 */
export function setPort(doc: Topology, args: SetPortArgs): Topology {
  const { port, device } = portById(doc, args.id);
  if (device.kind === 'switch' && (args.networkId != null || args.address != null)) {
    throw new CommandError('refused', 'A switch port carries every network and has no address of its own.', args.networkId != null ? 'networkId' : 'address');
  }
  const network = args.networkId ? doc.networks.find((n) => n.id === args.networkId) : undefined;
  if (args.networkId && !network) throw new CommandError('not-found', `There is no network "${args.networkId}" in this design.`, 'networkId');
  if (args.address && !addressSchema.safeParse(args.address).success) throw new CommandError('bad-args', 'The address is not an IPv4 or IPv6 address.', 'address');
  let address: Address | null | undefined = args.address;
  const old = port.address;
  if (address === undefined && network && network.id !== port.networkId && old?.mode === 'static' && !contains(network.cidr, old.ip)) address = null;
  const next = patch(port, { name: args.name, role: args.role, speedGbps: args.speedGbps, connector: args.connector, networkId: args.networkId, address });
  return next === port ? doc : mapPorts(doc, (p) => (p.id === args.id ? next : p));
}

const id = z.string().min(1);
const portKind = { speedGbps: speed.optional(), connector: z.enum(CONNECTORS).optional() };

export const portCommands = [
  command('addController', 'Add a controller to an array', z.object({ arrayId: id, dataPorts: z.number().int().min(0).max(32).optional(), managementPort: z.boolean().optional(), ...portKind }).strict(), addController),
  command('removeController', 'Remove a controller and its cables', z.object({ id }).strict(), removeController),
  command('addAdapter', 'Add a card to a host', z.object({ hostId: id, ports: z.number().int().min(1).max(8).optional(), ...portKind }).strict(), addAdapter),
  command('removeAdapter', 'Remove a card and its cables', z.object({ id }).strict(), removeAdapter),
  command('addPort', 'Add a port to a switch, controller or card', z.object({ ownerId: id, role: z.enum(PORT_ROLES).optional(), name: z.string().max(200).optional(), ...portKind }).strict(), addPort),
  command('removePort', 'Remove a port and its cables', z.object({ id }).strict(), removePort),
  command(
    'setPort',
    'Edit a port',
    z
      .object({
        id,
        name: z.string().max(200).optional(),
        role: z.enum(PORT_ROLES).optional(),
        ...portKind,
        networkId: z.string().min(1).nullable().optional(),
        address: addressSchema.nullable().optional(),
      })
      .strict(),
    setPort,
  ),
];
