import { z } from 'zod';
import { withPositions } from '@/shared/topology/layout';
import { CONNECTORS, PORT_SPEEDS, type Device, type Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { freeSpot } from '@/lib/editor/commands/layout';
import { withPlacement } from '@/lib/editor/commands/placement';
import { CommandError } from '@/lib/editor/errors';
import { collectIds } from '@/lib/editor/ids';
import type { ImportedHost } from '@/lib/editor/host-import';
import { buildDevice } from '@/lib/editor/templates';

/** All hosts of a confirmed inventory import in one edit, so one undo takes them all away. */
export type ImportHostsArgs = { hosts: ImportedHost[] };

const COLUMNS_PER_ROW = 10;

export function importHosts(doc: Topology, args: ImportHostsArgs): Topology {
  if (args.hosts.length === 0) throw new CommandError('refused', 'There are no hosts to add.', 'hosts');
  const taken = collectIds(doc);
  const start = freeSpot(doc);
  const added: Device[] = [];
  const positions: [string, { x: number; y: number }][] = [];
  args.hosts.forEach((h, i) => {
    const device = buildDevice(taken, 'host', h.name, h.name, { cards: h.cards, portsPerCard: h.portsPerCard, speedGbps: h.speedGbps, connector: h.connector });
    added.push(h.iqn && device.kind === 'host' ? { ...device, iqn: h.iqn } : device);
    positions.push([device.id, { x: start.x + (i % COLUMNS_PER_ROW) * 420, y: start.y + Math.floor(i / COLUMNS_PER_ROW) * 220 }]);
  });
  let next: Topology = { ...doc, devices: [...doc.devices, ...added], layout: withPositions(doc.layout, positions) };
  args.hosts.forEach((h, i) => {
    if (h.rack === null) return;
    next = withPlacement(next, next.devices.find((d) => d.id === added[i].id)!, { rack: h.rack, ru: h.ru ?? undefined });
  });
  return next;
}

const hostArg = z
  .object({
    name: z.string().min(1).max(200),
    iqn: z.string().max(223).nullable(),
    cards: z.number().int().min(1).max(8),
    portsPerCard: z.number().int().min(1).max(8),
    speedGbps: z.union(PORT_SPEEDS.map((s) => z.literal(s))),
    connector: z.enum(CONNECTORS),
    rack: z.string().max(100).nullable(),
    ru: z.number().int().min(1).max(100).nullable(),
  })
  .strict();

export const importCommands = [command('importHosts', 'Add the hosts of an inventory file', z.object({ hosts: z.array(hostArg).max(10_000) }).strict(), importHosts)];
