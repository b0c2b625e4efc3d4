import { z } from 'zod';
import type { Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { setPort } from '@/lib/editor/commands/ports';

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

export const assignNetworkCommands = [
  command('assignNetwork', 'Put ports on a network', z.object({ portIds: z.array(z.string().min(1)), networkId: z.string().min(1).nullable() }).strict(), assignNetwork),
];
