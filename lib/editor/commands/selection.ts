import { z } from 'zod';
import type { Topology } from '@/shared/topology/schema';
import { uncable } from '@/lib/editor/commands/cabling';
import { command } from '@/lib/editor/commands/define';
import { deleteDevices } from '@/lib/editor/commands/devices';
import { kindOf, type PartKind } from '@/lib/editor/commands/doc';
import { removeNetwork } from '@/lib/editor/commands/networks';
import { removeAdapter, removeController, removePort } from '@/lib/editor/commands/ports';

/**
 * The Delete key on a mixed selection: cables, devices, ports, cards, controllers and networks in
 * one step (one undo entry). Devices go before their parts, so an id that an earlier removal
 * already took along (a port of a deleted host) is skipped; unknown ids are ignored. Removing the last
 * controller of an array is still refused, as removeController refuses it.
 */
const PARTS: PartKind[] = ['port', 'adapter', 'controller', 'network'];

export function deleteItems(doc: Topology, args: { ids: string[] }): Topology {
  const byKind = new Map<PartKind, string[]>();
  for (const id of new Set(args.ids)) {
    const kind = kindOf(doc, id);
    if (kind) byKind.set(kind, [...(byKind.get(kind) ?? []), id]);
  }
  let result = uncable(doc, { ids: byKind.get('cable') ?? [] });
  result = deleteDevices(result, { ids: byKind.get('device') ?? [] });
  for (const kind of PARTS) {
    for (const id of byKind.get(kind) ?? []) {
      if (kindOf(result, id) !== kind) continue;
      if (kind === 'port') result = removePort(result, { id });
      else if (kind === 'adapter') result = removeAdapter(result, { id });
      else if (kind === 'controller') result = removeController(result, { id });
      else result = removeNetwork(result, { id });
    }
  }
  return result;
}

export const selectionCommands = [command('deleteItems', 'Delete everything selected', z.object({ ids: z.array(z.string()) }).strict(), deleteItems)];
