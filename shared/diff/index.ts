import { collect } from '@/shared/diff/collect';
import { compareSection } from '@/shared/diff/compare';
import { countLayoutMoved, documentChanges } from '@/shared/diff/document';
import {
  addressSection,
  cableSection,
  deviceSection,
  groupSection,
  networkSection,
  portSection,
} from '@/shared/diff/sections';
import { DIFF_SECTIONS, type DiffCounts, type DiffSection, type TopologyDiff } from '@/shared/diff/types';
import type { Topology } from '@/shared/topology/schema';

export * from '@/shared/diff/types';

/**
 * What changed between two versions' topology documents, for the versions screen and the diff route.
 *
 * Sections, each with `added`, `removed` and `changed` entries sorted by id:
 * - `devices`: name, kind, role (switches), rack (by id, shown by name), ru, heightU, iqn (hosts'
 *   initiator and arrays' target name), psus;
 * - `groups`: controllers and adapters (cards) as their own section — name, owning device, a
 *   controller's own target name — so
 *   a card added to a host reads as one entry, not as a change buried in the host;
 * - `ports`: name, role, speedGbps, connector, network, and the device and group holding it;
 * - `addresses`: one entry per port whose address came, went or changed (kept apart from `ports`
 *   because re-addressing is its own task for the installer);
 * - `cables`: ends (a, b — shown as "device / card port"; a cable turned end for end is unchanged),
 *   media, lengthM, label;
 * - `networks`: name, purpose, cidr, vlan, mtu, gateway;
 * plus `document` (name, security.chap, site.*, and one `rack <id>` / `power feed <id>` per rack or
 * feed added, removed or changed).
 *
 * Things are matched by id, so reordering devices or ports is no change. Canvas positions are not
 * part of the design: they never make the diff non-empty and are only counted in `layoutMoved`.
 * Pure and deterministic; linear in the size of the documents (only the entries found are sorted).
 */
export function diffTopologies(before: Topology, after: Topology): TopologyDiff {
  const b = collect(before);
  const a = collect(after);
  const versions = <T>(pick: (side: typeof b) => Map<string, T>) => [
    { items: pick(b), side: b },
    { items: pick(a), side: a },
  ] as const;
  const sections = {
    devices: compareSection(deviceSection, ...versions((s) => s.devices)),
    groups: compareSection(groupSection, ...versions((s) => s.groups)),
    ports: compareSection(portSection, ...versions((s) => s.ports)),
    cables: compareSection(cableSection, ...versions((s) => s.cables)),
    networks: compareSection(networkSection, ...versions((s) => s.networks)),
    addresses: compareSection(addressSection, ...versions((s) => s.ports)),
  };
  const document = documentChanges(before, after);
  const counts = countAll(sections, document.length);
  return { document, ...sections, layoutMoved: countLayoutMoved(before, after), counts, empty: counts.total === 0 };
}

function countAll(sections: Record<(typeof DIFF_SECTIONS)[number], DiffSection>, documentChanged: number): DiffCounts {
  let total = documentChanged;
  const counts = { document: documentChanged } as DiffCounts;
  for (const name of DIFF_SECTIONS) {
    const { added, removed, changed } = sections[name];
    counts[name] = { added: added.length, removed: removed.length, changed: changed.length };
    total += added.length + removed.length + changed.length;
  }
  counts.total = total;
  return counts;
}
