import { diffTopologies } from '@/shared/diff';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { withPositions } from '@/shared/topology/layout';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { randomDesign } from '../helpers/random-design';
import { hostileMap, idsOf, overTheWire, renameIds, safeTwin, withIdOfKind, PROTOTYPE_NAMES, ID_KINDS } from '../helpers/hostile';

/**
 * The version diff over hostile documents: two versions whose ids are prototype names, control
 * characters or colliding ids must give exactly the diff of the same versions with plain ids.
 */
function valid(doc: Topology): Topology {
  const checked = validateTopology(overTheWire(doc));
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues.slice(0, 3)));
  return checked.doc;
}

/** One hostile renaming applied to both versions, so the same thing keeps the same id in both. */
function bothHostile(before: Topology, after: Topology, seed: number): [Topology, Topology] {
  const map = hostileMap([...new Set([...idsOf(before), ...idsOf(after)].map((x) => x.id))], seed);
  const rename = (doc: Topology) => valid(renameIds(doc, (id) => map.get(id) ?? id));
  return [rename(before), rename(after)];
}

function expectSameAsTwin(before: Topology, after: Topology, label: string) {
  const twin = safeTwin(before, idsOf(after).map((x) => x.id));
  const diff = diffTopologies(before, after);
  const expected = twin.back(diffTopologies(renameIds(before, twin.to), renameIds(after, twin.to)));
  expect({ label, diff: JSON.parse(JSON.stringify(diff)) }).toEqual({ label, diff: JSON.parse(JSON.stringify(expected)) });
  return diff;
}

/** A later version: a device renamed and moved, a cable gone, a network's MTU changed. */
function edited(doc: Topology): Topology {
  const next = structuredClone(doc);
  next.devices[1].name = `${next.devices[1].name} (moved)`;
  next.cables = next.cables.slice(1);
  if (next.networks[0]) next.networks[0].mtu = 1500;
  next.layout = withPositions(doc.layout, doc.devices.map((d, i) => [d.id, { x: i * 300, y: 40 }] as const));
  return next;
}

describe('the diff of hostile documents', () => {
  it('matches the plain-id diff of Harbor Road v1 → v2 with every id hostile', () => {
    for (let seed = 1; seed <= 5; seed += 1) {
      const [v1, v2] = bothHostile(harborRoadV1(), harborRoadV2(), seed);
      const diff = expectSameAsTwin(v1, v2, `seed ${seed}`);
      expect(diff.empty).toBe(false);
    }
  });

  it('matches it for edits of random designs with hostile ids, layout moves included', () => {
    for (let seed = 1; seed <= 60; seed += 1) {
      const base = randomDesign(seed);
      const layout = withPositions(undefined, base.devices.map((d) => [d.id, { x: 0, y: 0 }] as const));
      const [before, after] = bothHostile({ ...base, layout }, edited({ ...base, layout }), seed);
      const diff = expectSameAsTwin(before, after, `seed ${seed}`);
      expect(diff.layoutMoved).toBeGreaterThan(0);
    }
  });

  it('counts a move of the device called __proto__ and of every other prototype name', () => {
    for (const name of PROTOTYPE_NAMES) {
      const before = valid(withIdOfKind(harborRoadV2(), 'switch', name)!);
      const moved = { ...before, layout: withPositions(before.layout, [[name, { x: 9999, y: 9999 }]]) };
      const diff = diffTopologies(before, valid(moved));
      expect({ name, moved: diff.layoutMoved, empty: diff.empty }).toEqual({ name, moved: 1, empty: true });
    }
  });

  it('names every kind of thing with a prototype-name id as added and removed', () => {
    for (const kind of ID_KINDS) {
      const base = harborRoadV2();
      const renamed = valid(withIdOfKind(base, kind, 'hasOwnProperty')!);
      const diff = diffTopologies(valid(base), renamed);
      const ids = [diff.devices, diff.groups, diff.ports, diff.cables, diff.networks].flatMap((section) => section.added.map((e) => e.id));
      expect({ kind, ids }).toEqual({ kind, ids: expect.arrayContaining(['hasOwnProperty']) });
    }
  });
});
