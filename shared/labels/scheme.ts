import { indexTopology, type TopologyIndex } from '@/shared/topology/index';
import type { Cable, Network, Topology } from '@/shared/topology/schema';

/**
 * A design's cable-label scheme, read from the labels it already has. The patterns write
 * `<design prefix><fabric tag>-<two-digit number>` (`HR-A-07`, `HR-M-03`: fabric A, management);
 * the canvas writes `C017`. Whatever the design uses, a label is a prefix and a number, and the
 * next free label of a prefix is one above the highest number that prefix has ever had.
 *
 * The prefix for a cable: that of the labelled cables on the same network (the most common one);
 * when its network has none yet, the design's own prefix (`HR-`, read from labels shaped like the
 * patterns') with the network's tag — the last short word of its name ("fabric A" → A), else its
 * first letter ("management" → M). A cable whose ends carry no network (between switches, or to a
 * port not yet on a network) belongs to its switch's fabric: the network most of that switch's
 * other cables carry. With none of that to go by it is tagged X.
 */
export type LabelParts = { prefix: string; number: number; width: number };

const NUMBERED = /^(.*?)(\d+)$/;
const PATTERN_SHAPED = /^(.*?)([A-Z0-9]{1,3})-\d+$/;

export function labelParts(label: string): LabelParts | null {
  const match = NUMBERED.exec(label);
  if (!match || match[1] === '') return null;
  return { prefix: match[1], number: Number(match[2]), width: match[2].length };
}

/** "fabric A" → "A", "fab-b" → "B", "management" → "M", "storage 12" → "12". */
export function networkTag(name: string): string {
  const tokens = name.trim().split(/[\s_-]+/).filter(Boolean);
  const last = tokens[tokens.length - 1] ?? '';
  if (tokens.length > 1 && last.length <= 2) return last.toUpperCase();
  return (tokens[0]?.[0] ?? 'X').toUpperCase();
}

/** The network of a cable's host or controller end; undefined when neither end is on one. */
export function endpointNetwork(cable: Cable, index: TopologyIndex): Network | undefined {
  for (const end of [cable.a, cable.b]) {
    const ref = index.ports.get(end);
    if (!ref || ref.device.kind === 'switch' || ref.port.networkId === undefined) continue;
    const network = index.networks.get(ref.port.networkId);
    if (network) return network;
  }
  return undefined;
}

/** Each switch's fabric: the network most of its cables' host and controller ends are on. */
function switchFabrics(doc: Topology, index: TopologyIndex): Map<string, Network> {
  const votes = new Map<string, string[]>();
  for (const cable of doc.cables) {
    const network = endpointNetwork(cable, index);
    if (!network) continue;
    for (const end of [cable.a, cable.b]) {
      const device = index.ports.get(end)?.device;
      if (device?.kind !== 'switch') continue;
      const list = votes.get(device.id);
      if (list) list.push(network.id);
      else votes.set(device.id, [network.id]);
    }
  }
  const fabrics = new Map<string, Network>();
  for (const [switchId, list] of votes) fabrics.set(switchId, index.networks.get(mostCommon(list)!)!);
  return fabrics;
}

/** The network a cable belongs to for labelling: its end's, else its switch's fabric. */
function labelNetwork(cable: Cable, index: TopologyIndex, fabrics: Map<string, Network>): Network | undefined {
  const direct = endpointNetwork(cable, index);
  if (direct) return direct;
  for (const end of [cable.a, cable.b]) {
    const device = index.ports.get(end)?.device;
    const fabric = device?.kind === 'switch' ? fabrics.get(device.id) : undefined;
    if (fabric) return fabric;
  }
  return undefined;
}

function mostCommon(values: Iterable<string>): string | undefined {
  const counts = new Map<string, number>();
  let best: string | undefined;
  let bestCount = 0;
  for (const value of values) {
    const count = (counts.get(value) ?? 0) + 1;
    counts.set(value, count);
    // Ties go to the first seen, so document order decides, the same everywhere.
    if (count > bestCount) {
      best = value;
      bestCount = count;
    }
  }
  return best;
}

export type LabelScheme = { prefixFor(cable: Cable): string };

/** The scheme of a document, from the labels `kept` (cable id → label) it will keep. */
export function labelScheme(doc: Topology, kept: ReadonlyMap<string, string>, index: TopologyIndex = indexTopology(doc)): LabelScheme {
  const fabrics = switchFabrics(doc, index);
  const byNetwork = new Map<string, string[]>();
  const designPrefixes: string[] = [];
  for (const cable of doc.cables) {
    const label = kept.get(cable.id);
    if (label === undefined) continue;
    const shaped = PATTERN_SHAPED.exec(label);
    if (shaped) designPrefixes.push(shaped[1]);
    const parts = labelParts(label);
    if (!parts) continue;
    const key = labelNetwork(cable, index, fabrics)?.id ?? '';
    const list = byNetwork.get(key);
    if (list) list.push(parts.prefix);
    else byNetwork.set(key, [parts.prefix]);
  }
  const designPrefix = mostCommon(designPrefixes) ?? '';
  const prefixes = new Map<string, string>();
  for (const [key, list] of byNetwork) prefixes.set(key, mostCommon(list)!);
  return {
    prefixFor(cable) {
      const network = labelNetwork(cable, index, fabrics);
      const known = prefixes.get(network?.id ?? '');
      if (known !== undefined) return known;
      return `${designPrefix}${network ? networkTag(network.name || network.id) : 'X'}-`;
    },
  };
}
