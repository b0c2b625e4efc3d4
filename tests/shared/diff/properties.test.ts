import fc from 'fast-check';
import { DIFF_SECTIONS, diffTopologies, type DiffSectionName, type TopologyDiff } from '@/shared/diff';
import type { Device, Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { randomDesign } from '../helpers/random-design';
import { applyEdits, EDIT_KINDS, type Edit } from './edits';

/**
 * Properties over random designs and random edits, checked against a plain oracle written apart
 * from the diff: per-section id sets taken straight from the documents, and a canonical text of
 * the design (layout dropped, arrays sorted by id, cable ends unordered, CHAP defaulted).
 */
const edit: fc.Arbitrary<Edit> = fc.record({ kind: fc.constantFrom(...EDIT_KINDS), i: fc.nat(200), j: fc.nat(5000) });
const pair = fc.record({ seed: fc.nat(), edits: fc.array(edit, { maxLength: 6 }) }).map(({ seed, edits }) => {
  const before = randomDesign(seed);
  return { before, after: applyEdits(before, edits) };
});

const groups = (d: Device) => (d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : []);
const ports = (d: Device) => (d.kind === 'switch' ? d.ports : groups(d).flatMap((g) => g.ports));

function idsBySection(doc: Topology): Record<DiffSectionName, Set<string>> {
  const allPorts = doc.devices.flatMap(ports);
  return {
    devices: new Set(doc.devices.map((d) => d.id)),
    groups: new Set(doc.devices.flatMap(groups).map((g) => g.id)),
    ports: new Set(allPorts.map((p) => p.id)),
    cables: new Set(doc.cables.map((c) => c.id)),
    networks: new Set(doc.networks.map((n) => n.id)),
    addresses: new Set(allPorts.filter((p) => p.address).map((p) => p.id)),
  };
}

/** JSON with object keys sorted, so key order never decides equality. */
function stable(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stable).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined).sort(([a], [b]) => (a < b ? -1 : 1));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stable(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

function canonical(doc: Topology): string {
  const sorted = <T extends { id: string }>(items: T[]) => [...items].sort((a, b) => (a.id < b.id ? -1 : 1));
  const device = (d: Device) => {
    const { ...rest } = d as Record<string, unknown>;
    for (const key of ['ports', 'controllers', 'adapters']) delete rest[key];
    const parts = d.kind === 'switch' ? [] : sorted(groups(d)).map((g) => ({ ...g, ports: sorted(g.ports) }));
    return { ...rest, parts, ports: d.kind === 'switch' ? sorted(d.ports) : [] };
  };
  return stable({
    name: doc.name,
    chap: doc.security?.chap ?? 'none',
    site: doc.site ?? {},
    racks: sorted(doc.racks ?? []),
    powerFeeds: sorted(doc.powerFeeds ?? []),
    devices: sorted(doc.devices).map(device),
    cables: sorted(doc.cables).map(({ a, b, ...rest }) => ({ ...rest, ends: [a, b].sort() })),
    networks: sorted(doc.networks),
  });
}

const minus = (a: Set<string>, b: Set<string>) => [...a].filter((id) => !b.has(id)).sort();
const sortedIds = (ids: string[]) => [...ids].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));

function checkShape(diff: TopologyDiff, before: Topology, after: Topology) {
  const idsBefore = idsBySection(before);
  const idsAfter = idsBySection(after);
  let total = diff.document.length;
  for (const name of DIFF_SECTIONS) {
    const section = diff[name];
    expect(section.removed.map((e) => e.id)).toEqual(minus(idsBefore[name], idsAfter[name]));
    expect(section.added.map((e) => e.id)).toEqual(minus(idsAfter[name], idsBefore[name]));
    const changedIds = section.changed.map((e) => e.id);
    expect(changedIds).toEqual(sortedIds(changedIds));
    for (const entry of section.changed) {
      expect(idsBefore[name].has(entry.id) && idsAfter[name].has(entry.id)).toBe(true);
      expect(entry.changes.length).toBeGreaterThan(0);
      expect(entry.changes.every((c) => c.before !== c.after)).toBe(true);
    }
    for (const entry of [...section.added, ...section.removed, ...section.changed]) {
      expect(new Set(entry.changes.map((c) => c.field)).size).toBe(entry.changes.length);
    }
    expect(diff.counts[name]).toEqual({ added: section.added.length, removed: section.removed.length, changed: section.changed.length });
    total += section.added.length + section.removed.length + section.changed.length;
  }
  expect(diff.counts.total).toBe(total);
  expect(diff.empty).toBe(total === 0);
  // Plain JSON: nothing undefined, nothing that does not survive the wire.
  expect(JSON.parse(JSON.stringify(diff))).toEqual(diff);
}

describe('diff properties over random designs and edits', () => {
  it('finds no difference between a random design and itself or a copy', () => {
    fc.assert(
      fc.property(fc.nat(), (seed) => {
        const doc = randomDesign(seed);
        expect(diffTopologies(doc, doc).empty).toBe(true);
        expect(diffTopologies(doc, structuredClone(doc)).counts.total).toBe(0);
      }),
      { numRuns: 200 },
    );
  });

  it('lists as removed exactly what only the earlier version has and as added what only the later has', () => {
    fc.assert(
      fc.property(pair, ({ before, after }) => {
        expect(validateTopology(after)).toMatchObject({ ok: true });
        checkShape(diffTopologies(before, after), before, after);
      }),
      { numRuns: 300 },
    );
  });

  it('is empty exactly when the designs agree apart from order, cable direction and layout', () => {
    let emptyRuns = 0;
    let nonEmptyRuns = 0;
    fc.assert(
      fc.property(pair, ({ before, after }) => {
        const diff = diffTopologies(before, after);
        const same = canonical(before) === canonical(after);
        expect(diff.empty).toBe(same);
        if (same) emptyRuns += 1;
        else nonEmptyRuns += 1;
      }),
      { numRuns: 400 },
    );
    // The edits must reach both answers, or the property says little.
    expect(emptyRuns).toBeGreaterThan(20);
    expect(nonEmptyRuns).toBeGreaterThan(100);
  });

  it('reads the same backwards: added and removed swap, the same things changed', () => {
    fc.assert(
      fc.property(pair, ({ before, after }) => {
        const forward = diffTopologies(before, after);
        const backward = diffTopologies(after, before);
        for (const name of DIFF_SECTIONS) {
          expect(backward[name].added.map((e) => e.id)).toEqual(forward[name].removed.map((e) => e.id));
          expect(backward[name].removed.map((e) => e.id)).toEqual(forward[name].added.map((e) => e.id));
          expect(backward[name].changed.map((e) => e.id)).toEqual(forward[name].changed.map((e) => e.id));
        }
        expect(backward.document.map((c) => [c.field, c.after, c.before])).toEqual(forward.document.map((c) => [c.field, c.before, c.after]));
      }),
      { numRuns: 200 },
    );
  });
});
