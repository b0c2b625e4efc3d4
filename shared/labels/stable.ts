import { labelParts, labelScheme } from '@/shared/labels/scheme';
import { indexTopology } from '@/shared/topology/index';
import type { Cable, Topology } from '@/shared/topology/schema';

/**
 * Stable cable labels across the versions of one design. A label gets printed and stuck on a cable
 * in the room, so:
 * - a cable keeps its label from one version to the next (saved without one, it gets its old one back);
 * - a cable without a label gets the next free label of the design's scheme (shared/labels/scheme.ts);
 * - a label once carried by a cable that is gone is never handed to a different cable later: such a
 *   cable gets a new label instead (its old prefix, the next free number). The same cable coming back
 *   (same id, same two ports) may have its label back;
 * - two cables of one version never share a label: the one that had it before keeps it.
 * Labels the designer changes by hand are kept when they are free (a swap between two cables
 * that are both still there is a correction, not a reuse).
 *
 * Pure: the server gives it the design's earlier versions (labelHistory) and stores what it returns.
 * Answers the very same document when no label changes.
 */
export type LabelHolder = { cableId: string; a: string; b: string };

export type LabelHistory = {
  /** The cables of the version this one follows (the latest stored), by id. */
  previous: ReadonlyMap<string, Cable>;
  /** Every label an earlier version gave a cable, with the last cable that carried it. */
  holders: ReadonlyMap<string, LabelHolder>;
};

export const NO_LABEL_HISTORY: LabelHistory = { previous: new Map(), holders: new Map() };

/** A LabelHistory as plain JSON (Maps do not cross a process boundary): lists, never objects keyed by ids. */
export type LabelHistoryData = { previous: Cable[]; holders: [string, LabelHolder][] };

export function labelHistoryData(history: LabelHistory): LabelHistoryData {
  return { previous: [...history.previous.values()], holders: [...history.holders.entries()] };
}

export function labelHistoryFromData(data: LabelHistoryData): LabelHistory {
  return { previous: new Map(data.previous.map((cable) => [cable.id, cable])), holders: new Map(data.holders) };
}

/** The history of a design from its versions' cables, oldest version first. */
export function labelHistory(versions: readonly { cables: readonly Cable[] }[]): LabelHistory {
  const holders = new Map<string, LabelHolder>();
  for (const version of versions) {
    for (const cable of version.cables) {
      const label = cable.label?.trim();
      if (label) holders.set(label, { cableId: cable.id, a: cable.a, b: cable.b });
    }
  }
  const last = versions[versions.length - 1];
  return { previous: new Map((last?.cables ?? []).map((cable) => [cable.id, cable])), holders };
}

function sameEnds(holder: LabelHolder, cable: Cable): boolean {
  return (holder.a === cable.a && holder.b === cable.b) || (holder.a === cable.b && holder.b === cable.a);
}

export function assignStableLabels(doc: Topology, history: LabelHistory): Topology {
  const present = new Set(doc.cables.map((cable) => cable.id));
  const mayCarry = (cable: Cable, label: string): boolean => {
    const holder = history.holders.get(label);
    if (!holder) return true;
    if (holder.cableId === cable.id) return history.previous.has(cable.id) || sameEnds(holder, cable);
    return present.has(holder.cableId);
  };
  const own = (cable: Cable) => cable.label?.trim() || undefined;
  const previousLabel = (cable: Cable) => history.previous.get(cable.id)?.label?.trim() || undefined;

  const kept = new Map<string, string>();
  const taken = new Set<string>();
  const keep = (cable: Cable, label: string | undefined): boolean => {
    if (label === undefined || taken.has(label) || kept.has(cable.id) || !mayCarry(cable, label)) return false;
    kept.set(cable.id, label);
    taken.add(label);
    return true;
  };
  // Who had a label before keeps it first; then labels set by hand; then cables saved without their old one.
  for (const cable of doc.cables) if (own(cable) !== undefined && own(cable) === previousLabel(cable)) keep(cable, own(cable));
  for (const cable of doc.cables) keep(cable, own(cable));
  for (const cable of doc.cables) keep(cable, previousLabel(cable));

  const next = numberer([...history.holders.keys(), ...doc.cables.map(own).filter((l): l is string => l !== undefined)]);
  const scheme = labelScheme(doc, kept, indexTopology(doc));
  let changed = false;
  const cables = doc.cables.map((cable) => {
    let label = kept.get(cable.id);
    if (label === undefined) {
      const mine = own(cable);
      label = next(labelParts(mine ?? '')?.prefix ?? scheme.prefixFor(cable), taken);
      taken.add(label);
    }
    if (label === cable.label) return cable;
    changed = true;
    return { ...cable, label };
  });
  return changed ? { ...doc, cables } : doc;
}

/** The next free label of a prefix: one above the highest number it ever had, as wide as it was written. */
function numberer(used: readonly string[]): (prefix: string, taken: ReadonlySet<string>) => string {
  const highest = new Map<string, { number: number; width: number }>();
  const everUsed = new Set(used);
  for (const label of used) {
    const parts = labelParts(label);
    if (!parts) continue;
    const seen = highest.get(parts.prefix);
    highest.set(parts.prefix, { number: Math.max(seen?.number ?? 0, parts.number), width: Math.max(seen?.width ?? 2, parts.width) });
  }
  return (prefix, taken) => {
    const seen = highest.get(prefix) ?? { number: 0, width: 2 };
    let number = seen.number;
    let label: string;
    do {
      number += 1;
      label = `${prefix}${String(number).padStart(seen.width, '0')}`;
    } while (taken.has(label) || everUsed.has(label));
    highest.set(prefix, { number, width: seen.width });
    return label;
  };
}
