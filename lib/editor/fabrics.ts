import { tupleKey } from '@/shared/keys/tuple';
import type { Network, Topology } from '@/shared/topology/schema';
import { iteratePorts } from '@/shared/topology/index';
import { FABRIC_INKS } from '@/lib/editor/drawing';

/**
 * The fabric cue of each cable: a short tag ("A", "B", "M") and an ink. A cable belongs to the
 * network of its host or controller end; a cable between switches, or one whose end has no
 * network yet, takes the fabric of its switch — the network most of that switch's endpoints are
 * on, or, in a design without networks, the last part of the switch's name ("fab-a" → "A",
 * "switch-2" → "2"). Tags are interned, so an unchanged cable keeps an identical tag object and
 * its memoised drawing is skipped.
 */
export type FabricTag = { tag: string; ink: string; name: string };

const interned = new Map<string, FabricTag>();
function intern(tag: string, ink: string, name: string): FabricTag {
  const key = tupleKey([tag, ink, name]);
  let found = interned.get(key);
  if (!found) {
    found = { tag, ink, name };
    interned.set(key, found);
  }
  return found;
}

/** "fabric A" → "A", "fab-b" → "B", "management" → "M", "storage 12" → "12". */
export function tagFromName(name: string): string {
  const tokens = name.trim().split(/[\s_-]+/).filter(Boolean);
  const last = tokens[tokens.length - 1] ?? '';
  if (tokens.length > 1 && last.length <= 2) return last.toUpperCase();
  return (tokens[0]?.[0] ?? '?').toUpperCase();
}

/** One tag per network, in list order; a tag two networks would share gets a number ("S", "S2"). */
export function networkTags(networks: readonly Network[]): Map<string, FabricTag> {
  const used = new Map<string, number>();
  const tags = new Map<string, FabricTag>();
  networks.forEach((network, index) => {
    const base = tagFromName(network.name || network.id);
    const count = (used.get(base) ?? 0) + 1;
    used.set(base, count);
    const tag = count === 1 ? base : `${base}${count}`;
    tags.set(network.id, intern(tag, FABRIC_INKS[index % FABRIC_INKS.length], network.name || network.id));
  });
  return tags;
}

export type Fabrics = {
  byCable: ReadonlyMap<string, FabricTag | null>;
  bySwitch: ReadonlyMap<string, FabricTag | null>;
  byNetwork: ReadonlyMap<string, FabricTag>;
};

type End = { deviceId: string; isSwitch: boolean; networkId?: string };

export function computeFabrics(doc: Topology): Fabrics {
  const byNetwork = networkTags(doc.networks);
  const ends = new Map<string, End>();
  for (const ref of iteratePorts(doc)) ends.set(ref.port.id, { deviceId: ref.device.id, isSwitch: ref.device.kind === 'switch', networkId: ref.port.networkId });

  // Which networks each switch's endpoints are on.
  const votes = new Map<string, Map<string, number>>();
  for (const cable of doc.cables) {
    const a = ends.get(cable.a);
    const b = ends.get(cable.b);
    if (!a || !b) continue;
    for (const [sw, other] of [[a, b], [b, a]] as const) {
      if (!sw.isSwitch || other.isSwitch || !other.networkId || !byNetwork.has(other.networkId)) continue;
      const tally = votes.get(sw.deviceId) ?? new Map<string, number>();
      tally.set(other.networkId, (tally.get(other.networkId) ?? 0) + 1);
      votes.set(sw.deviceId, tally);
    }
  }
  const bySwitch = new Map<string, FabricTag | null>();
  let named = 0;
  for (const device of doc.devices) {
    if (device.kind !== 'switch') continue;
    const tally = votes.get(device.id);
    if (tally) {
      const [best] = [...tally.entries()].sort((x, y) => y[1] - x[1] || (x[0] < y[0] ? -1 : 1))[0];
      bySwitch.set(device.id, byNetwork.get(best) ?? null);
    } else {
      bySwitch.set(device.id, intern(tagFromName(device.name || device.id), FABRIC_INKS[named % FABRIC_INKS.length], device.name));
      named += 1;
    }
  }

  const byCable = new Map<string, FabricTag | null>();
  for (const cable of doc.cables) {
    const a = ends.get(cable.a);
    const b = ends.get(cable.b);
    if (!a || !b) continue;
    const endpoint = [a, b].find((end) => !end.isSwitch && end.networkId && byNetwork.has(end.networkId));
    if (endpoint) byCable.set(cable.id, byNetwork.get(endpoint.networkId!)!);
    else {
      const switches = [a, b].filter((end) => end.isSwitch).map((end) => bySwitch.get(end.deviceId) ?? null);
      const same = switches.length > 0 && switches.every((t) => t === switches[0]);
      byCable.set(cable.id, same ? switches[0] : null);
    }
  }
  return { byCable, bySwitch, byNetwork };
}
