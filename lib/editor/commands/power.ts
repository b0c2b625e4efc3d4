import { z } from 'zod';
import type { Psu, Topology } from '@/shared/topology/schema';
import { cleanText } from '@/shared/text/clean';
import { command } from '@/lib/editor/commands/define';
import { deviceById, replaceDevice } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';
import { claimId, collectIds, slug } from '@/lib/editor/ids';

/**
 * Power (topology-format.md, format 2): add and remove power feeds, and set a device's PSUs and the
 * feed each is on. The analysis treats PSUs and feeds as failure units; a PSU on no feed, or a device
 * with every PSU on one feed, is a finding, never refused.
 */
export type AddFeedArgs = { name: string; id?: string };

export function addFeed(doc: Topology, args: AddFeedArgs): Topology {
  const name = cleanText(args.name).trim();
  if (!name) throw new CommandError('bad-args', 'A power feed needs a name, such as "Feed A".', 'name');
  const taken = collectIds(doc);
  if (args.id !== undefined && taken.has(args.id)) throw new CommandError('bad-args', `The id ${JSON.stringify(args.id)} is taken.`, 'id');
  const id = args.id ?? claimId(taken, `feed-${slug(name) || 'power'}`);
  return { ...doc, powerFeeds: [...(doc.powerFeeds ?? []), { id, name }] };
}

export type RemoveFeedArgs = { id: string };

/** Remove a feed; the PSUs on it are left on no feed (a finding until they get another). */
export function removeFeed(doc: Topology, args: RemoveFeedArgs): Topology {
  if (!(doc.powerFeeds ?? []).some((f) => f.id === args.id)) throw new CommandError('not-found', `There is no power feed ${JSON.stringify(args.id)}.`, 'id');
  const devices = doc.devices.map((device) => {
    if (!(device.psus ?? []).some((p) => p.feedId === args.id)) return device;
    return { ...device, psus: device.psus!.map((p) => (p.feedId === args.id ? { id: p.id, name: p.name } : p)) };
  });
  return { ...doc, powerFeeds: doc.powerFeeds!.filter((f) => f.id !== args.id), devices };
}

/** One entry per PSU, in order: the feed it is on, or null for none. An empty list removes the PSUs. */
export type SetPsusArgs = { id: string; feeds: (string | null)[] };

export function setPsus(doc: Topology, args: SetPsusArgs): Topology {
  const device = deviceById(doc, args.id);
  const feeds = new Set((doc.powerFeeds ?? []).map((f) => f.id));
  args.feeds.forEach((feed, i) => {
    if (feed !== null && !feeds.has(feed)) throw new CommandError('not-found', `There is no power feed ${JSON.stringify(feed)}.`, `feeds.${i}`);
  });
  const old = device.psus ?? [];
  const taken = collectIds(doc);
  for (const psu of old) taken.delete(psu.id);
  // PSUs that stay keep their ids and names (labels and the build record refer to them); new ones get fresh ids.
  const psus: Psu[] = args.feeds.map((feed, i) => {
    const kept = old[i];
    const id = kept && !taken.has(kept.id) ? kept.id : claimId(taken, `${device.id}-psu-${i + 1}`);
    taken.add(id);
    return { id, name: kept?.name ?? `PSU ${i + 1}`, ...(feed === null ? {} : { feedId: feed }) };
  });
  return replaceDevice(doc, args.id, (d) => {
    const { psus: _gone, ...rest } = d;
    return (psus.length > 0 ? { ...rest, psus } : rest) as typeof d;
  });
}

export const powerCommands = [
  command('addFeed', 'Add a power feed', z.object({ name: z.string().max(200), id: z.string().min(1).max(200).optional() }).strict(), addFeed),
  command('removeFeed', 'Remove a power feed', z.object({ id: z.string().min(1) }).strict(), removeFeed),
  command(
    'setPsus',
    "Set a device's power supplies and their feeds",
    z.object({ id: z.string().min(1), feeds: z.array(z.string().min(1).nullable()).max(8) }).strict(),
    setPsus,
  ),
];
