import { z } from 'zod';
import type { Topology } from '@/shared/topology/schema';
import { indexTopology, otherEnd, type PortRef } from '@/shared/topology/index';
import { autoAssignAddresses } from '@/lib/editor/commands/addressing';
import { command } from '@/lib/editor/commands/define';
import { setPort } from '@/lib/editor/commands/ports';
import { CommandError } from '@/lib/editor/errors';

/**
 * Puts several host or controller ports on one network (or none) in one step — "every management
 * port onto the management network" is one undo, not thirty. Each port goes through setPort, so a
 * static address that does not fit the new network is dropped exactly as it is for one port.
 */
export type AssignNetworkArgs = { portIds: string[]; networkId: string | null };

export function assignNetwork(doc: Topology, args: AssignNetworkArgs): Topology {
  let result = doc;
  for (const id of new Set(args.portIds)) result = setPort(result, { id, networkId: args.networkId });
  return result;
}

/**
 * Which data ports a bulk assignment takes: the host and controller data ports cabled to one switch
 * (`switch`), to any switch of its fabric — the switches joined to it by inter-switch cables
 * (`fabric`) — or those of a selection (`selection`: devices, controllers, cards, ports; a switch
 * in it stands for its neighbours). Management ports are never taken. Document order, each once.
 */
export type PortScope = { kind: 'switch'; id: string } | { kind: 'fabric'; id: string } | { kind: 'selection'; ids: string[] };

function isEndpointData(ref: PortRef | undefined): ref is PortRef {
  return !!ref && ref.device.kind !== 'switch' && ref.port.role === 'data';
}

function requireSwitch(doc: Topology, id: string): void {
  const device = doc.devices.find((d) => d.id === id);
  if (!device) throw new CommandError('not-found', `There is nothing with the id "${id}" in this design.`, 'scope.id');
  if (device.kind !== 'switch') throw new CommandError('wrong-kind', `"${device.name || id}" is not a switch.`, 'scope.id');
}

/** The switches joined to `start` by switch-to-switch cables, `start` included. */
function fabricSwitches(doc: Topology, start: string): Set<string> {
  const index = indexTopology(doc);
  const seen = new Set([start]);
  const queue = [start];
  while (queue.length > 0) {
    const here = queue.pop()!;
    const device = index.devices.get(here);
    if (device?.kind !== 'switch') continue;
    for (const port of device.ports) {
      for (const cable of index.cablesByPort.get(port.id) ?? []) {
        const far = index.ports.get(otherEnd(cable, port.id));
        if (far && far.device.kind === 'switch' && !seen.has(far.device.id)) {
          seen.add(far.device.id);
          queue.push(far.device.id);
        }
      }
    }
  }
  return seen;
}

export function portsInScope(doc: Topology, scope: PortScope): string[] {
  const index = indexTopology(doc);
  const wanted = new Set<string>();
  const neighboursOf = (switches: ReadonlySet<string>) => {
    for (const cable of doc.cables) {
      const a = index.ports.get(cable.a);
      const b = index.ports.get(cable.b);
      if (a && b && switches.has(a.device.id) && isEndpointData(b)) wanted.add(b.port.id);
      if (a && b && switches.has(b.device.id) && isEndpointData(a)) wanted.add(a.port.id);
    }
  };
  if (scope.kind === 'switch') {
    requireSwitch(doc, scope.id);
    neighboursOf(new Set([scope.id]));
  } else if (scope.kind === 'fabric') {
    requireSwitch(doc, scope.id);
    neighboursOf(fabricSwitches(doc, scope.id));
  } else {
    const picked = new Set(scope.ids);
    const switches = new Set<string>();
    for (const id of picked) {
      const device = index.devices.get(id);
      if (device?.kind === 'switch') switches.add(id);
      else if (!device && !index.controllers.has(id) && !index.adapters.has(id) && !index.ports.has(id)) {
        throw new CommandError('not-found', `There is nothing with the id "${id}" in this design.`, 'scope.ids');
      }
    }
    neighboursOf(switches);
    for (const ref of index.ports.values()) {
      if (!isEndpointData(ref)) continue;
      const group = ref.controller?.id ?? ref.adapter?.id;
      if (picked.has(ref.port.id) || picked.has(ref.device.id) || (group !== undefined && picked.has(group))) wanted.add(ref.port.id);
    }
  }
  // Document order, whatever order the scope found them in.
  return [...index.ports.keys()].filter((id) => wanted.has(id));
}

export type BulkAssignArgs = { scope: PortScope; networkId: string | null; assignAddresses?: boolean };

/**
 * One undoable step: every data port of the scope onto the network, and — unless `assignAddresses`
 * is false — static addresses for those still without one (targets low, hosts high; addressing.ts).
 */
export function bulkAssignNetwork(doc: Topology, args: BulkAssignArgs): Topology {
  const portIds = portsInScope(doc, args.scope);
  if (args.networkId !== null && !doc.networks.some((n) => n.id === args.networkId)) {
    throw new CommandError('not-found', `There is no network "${args.networkId}" in this design.`, 'networkId');
  }
  const moved = assignNetwork(doc, { portIds, networkId: args.networkId });
  if (args.networkId === null || args.assignAddresses === false || portIds.length === 0) return moved;
  return autoAssignAddresses(moved, { portIds });
}

const scopeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('switch'), id: z.string().min(1) }).strict(),
  z.object({ kind: z.literal('fabric'), id: z.string().min(1) }).strict(),
  z.object({ kind: z.literal('selection'), ids: z.array(z.string().min(1)).max(100_000) }).strict(),
]);

export const assignNetworkCommands = [
  command('assignNetwork', 'Put ports on a network', z.object({ portIds: z.array(z.string().min(1)), networkId: z.string().min(1).nullable() }).strict(), assignNetwork),
  command(
    'bulkAssignNetwork',
    'Put the data ports of a switch’s neighbours, a fabric or a selection on a network',
    z.object({ scope: scopeSchema, networkId: z.string().min(1).nullable(), assignAddresses: z.boolean().optional() }).strict(),
    bulkAssignNetwork,
  ),
];
