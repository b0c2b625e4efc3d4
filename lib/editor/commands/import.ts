import { z } from 'zod';
import { withPositions } from '@/shared/topology/layout';
import { CONNECTORS, DEFAULT_RACK_HEIGHT_U, PORT_SPEEDS, type Device, type Rack, type Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { freeSpot } from '@/lib/editor/commands/layout';
import { withPlacement } from '@/lib/editor/commands/placement';
import { CommandError } from '@/lib/editor/errors';
import { claimId, collectIds, slug } from '@/lib/editor/ids';
import type { ImportedHost } from '@/lib/editor/host-import';
import { buildDevice } from '@/lib/editor/templates';

/** All hosts of a confirmed inventory import in one edit, so one undo takes them all away. */
export type ImportHostsArgs = { hosts: ImportedHost[] };

const COLUMNS_PER_ROW = 10;

export function importHosts(doc: Topology, args: ImportHostsArgs): Topology {
  if (args.hosts.length === 0) throw new CommandError('refused', 'There are no hosts to add.', 'hosts');
  const taken = collectIds(doc);
  const start = freeSpot(doc);
  const racks = [...(doc.racks ?? [])];
  const rackByName = new Map<string, Rack>();
  for (const rack of racks) if (!rackByName.has(rack.name)) rackByName.set(rack.name, rack);
  const added: Device[] = [];
  const positions: [string, { x: number; y: number }][] = [];
  const unitLater: [string, string][] = [];
  args.hosts.forEach((h, i) => {
    let device = buildDevice(taken, 'host', h.name, h.name, { cards: h.cards, portsPerCard: h.portsPerCard, speedGbps: h.speedGbps, connector: h.connector });
    if (h.iqn && device.kind === 'host') device = { ...device, iqn: h.iqn };
    if (h.rack !== null) {
      let rack = rackByName.get(h.rack);
      if (!rack) {
        rack = { id: claimId(taken, `rk-${slug(h.rack) || 'rack'}`), name: h.rack, heightU: DEFAULT_RACK_HEIGHT_U };
        rackByName.set(h.rack, rack);
        racks.push(rack);
      }
      if (h.ru !== null) device = { ...device, placement: { rackId: rack.id, ru: h.ru } };
      else unitLater.push([device.id, h.rack]);
    }
    added.push(device);
    positions.push([device.id, { x: start.x + (i % COLUMNS_PER_ROW) * 420, y: start.y + Math.floor(i / COLUMNS_PER_ROW) * 220 }]);
  });
  let next: Topology = { ...doc, racks, devices: [...doc.devices, ...added], layout: withPositions(doc.layout, positions) };
  if (racks.length === 0 && doc.racks === undefined) delete next.racks;
  // A host with a rack but no unit takes the lowest free one, in file order.
  for (const [id, rack] of unitLater) next = withPlacement(next, next.devices.find((d) => d.id === id)!, { rack });
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
