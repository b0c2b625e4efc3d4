import type { UnitKind } from '@/shared/analysis/types';
import { displayName, indexTopology, type TopologyIndex } from '@/shared/topology';
import type { Topology } from '@/shared/topology/schema';
import { createNamer } from '@/lib/report/names';

/** One thing a reviewer can fail in the what-if panel, with the words it can be found by. */
export type FailureUnit = { id: string; kind: UnitKind; name: string; search: string };

export const UNIT_KIND_LABELS: Record<UnitKind, string> = {
  switch: 'Switch',
  controller: 'Controller',
  adapter: 'Card',
  cable: 'Cable',
  psu: 'Power supply',
  feed: 'Power feed',
};

/**
 * Every failure unit of the document (docs/analysis.md: each cable, card, switch and
 * controller; docs/topology-format.md format 2: each PSU and power feed), the big ones first: switches,
 * controllers, cards, cables, then feeds and PSUs, in document order.
 */
export function failureUnits(doc: Topology, index: TopologyIndex = indexTopology(doc)): FailureUnit[] {
  const namer = createNamer(doc, index);
  const units: FailureUnit[] = [];
  const add = (id: string, kind: UnitKind, extra: string[]) => {
    const name = namer.unit(id);
    units.push({ id, kind, name, search: [name, id, ...extra].join(' ').toLowerCase() });
  };
  for (const device of doc.devices) if (device.kind === 'switch') add(device.id, 'switch', [displayName(device)]);
  for (const [id, { array }] of index.controllers) add(id, 'controller', [displayName(array)]);
  for (const [id, { host }] of index.adapters) {
    // An onboard group holding only management ports is not on any data path; failing it shows nothing.
    const adapter = index.adapters.get(id)!.adapter;
    if (adapter.ports.some((p) => p.role === 'data')) add(id, 'adapter', [displayName(host), 'card']);
  }
  for (const cable of doc.cables) add(cable.id, 'cable', [cable.label ?? '']);
  // Power (format 2): feeds, then each device's supplies.
  for (const feed of doc.powerFeeds ?? []) add(feed.id, 'feed', [displayName(feed), 'power feed']);
  for (const device of doc.devices) for (const psu of device.psus ?? []) add(psu.id, 'psu', [displayName(device), displayName(psu), 'power supply psu']);
  return units;
}

/**
 * Units whose every search word appears in their name, id or owner: "cam-rec-2 card" finds that
 * host's cards, "fab-a" finds the switch and every cable to it. An empty query matches nothing,
 * so the panel never lists hundreds of cables unasked.
 */
export function searchUnits(units: readonly FailureUnit[], query: string, limit = 20): FailureUnit[] {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return [];
  const found: FailureUnit[] = [];
  for (const unit of units) {
    if (words.every((w) => unit.search.includes(w))) found.push(unit);
    if (found.length >= limit) break;
  }
  return found;
}

/** The search hint's examples, taken from the open design: a switch, a cable's label and a host's cards. */
export function searchHint(doc: Topology): string {
  const sw = doc.devices.find((d) => d.kind === 'switch');
  const host = doc.devices.find((d) => d.kind === 'host');
  const cable = doc.cables[0];
  const examples = [sw && displayName(sw), cable && (cable.label ?? cable.id), host && `${displayName(host)} card`].filter((e): e is string => Boolean(e));
  return examples.length > 0 ? `A name, label or host, such as ${examples.join(', ')}` : 'A name, label or host';
}
