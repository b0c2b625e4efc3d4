import { diffTopologies } from '@/shared/diff';
import v1Json from '@/shared/fixtures/harbor-road-v1.json';
import v2Json from '@/shared/fixtures/harbor-road-v2.json';
import { indexTopology, type TopologyIndex } from '@/shared/topology';
import type { Cable, Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';

/**
 * Harbor Road (docs/demo.md's demo): version 1 has cam-rec-2 cabled only to fab-a and one controller's
 * management port on fab-b; version 2 fixes both. Every expectation below is read off the two
 * committed fixtures, not off the diff's own output.
 */
function load(json: unknown): Topology {
  const checked = validateTopology(json);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.doc;
}

const v1 = load(v1Json);
const v2 = load(v2Json);
const i1 = indexTopology(v1);
const i2 = indexTopology(v2);

const ownerName = (index: TopologyIndex, portId: string) => index.ports.get(portId)!.device.name;
/** "cam-rec-2 / card-2 p1", built from the fixture's own names. */
function label(index: TopologyIndex, portId: string): string {
  const ref = index.ports.get(portId)!;
  const group = ref.adapter ?? ref.controller;
  return group ? `${ref.device.name} / ${group.name} ${ref.port.name}` : `${ref.device.name} / ${ref.port.name}`;
}
const devicesOn = (index: TopologyIndex, cables: Cable[], host: string) =>
  cables.filter((c) => ownerName(index, c.a) === host || ownerName(index, c.b) === host).map((c) => [c.a, c.b].map((p) => ownerName(index, p)).find((n) => n !== host));

describe('diff of the Harbor Road demo, version 1 to version 2', () => {
  const diff = diffTopologies(v1, v2);
  const ids1 = new Set(v1.cables.map((c) => c.id));
  const ids2 = new Set(v2.cables.map((c) => c.id));

  it("starts from the flaw docs/demo.md describes: cam-rec-2's storage cables reach fab-a only in version 1, both fabrics in version 2", () => {
    expect(new Set(devicesOn(i1, v1.cables, 'cam-rec-2'))).toEqual(new Set(['fab-a', 'oob-1']));
    expect(new Set(devicesOn(i2, v2.cables, 'cam-rec-2'))).toEqual(new Set(['fab-a', 'fab-b', 'oob-1']));
  });

  it("adds cam-rec-2's second storage cable, to fab-b", () => {
    const added = v2.cables.filter((c) => !ids1.has(c.id));
    expect(added).toHaveLength(1);
    const [cable] = added;
    const hostEnd = ownerName(i2, cable.a) === 'cam-rec-2' ? cable.a : cable.b;
    const switchEnd = hostEnd === cable.a ? cable.b : cable.a;
    expect(ownerName(i2, switchEnd)).toBe('fab-b');
    expect(diff.cables.added.map((c) => c.id)).toEqual([cable.id]);
    expect(diff.cables.added[0].name).toBe(cable.label);
    expect(diff.cables.added[0].changes).toEqual(
      expect.arrayContaining([
        { field: 'a', before: null, after: label(i2, cable.a) },
        { field: 'b', before: null, after: label(i2, cable.b) },
        { field: 'media', before: null, after: cable.media },
      ]),
    );
    expect(label(i2, hostEnd)).toMatch(/^cam-rec-2 \/ /);
  });

  it("recables the controller's management port from fab-b to oob-1", () => {
    const changed = v2.cables.filter((c) => ids1.has(c.id) && JSON.stringify(c) !== JSON.stringify(v1.cables.find((o) => o.id === c.id)));
    expect(changed).toHaveLength(1);
    const after = changed[0];
    const before = v1.cables.find((c) => c.id === after.id)!;
    // The unmoved end is a management port on one of vault-1's controllers.
    const fixedEnd = [before.a, before.b].find((p) => p === after.a || p === after.b)!;
    const fixedRef = i2.ports.get(fixedEnd)!;
    expect(fixedRef.controller).toBeDefined();
    expect(fixedRef.port.role).toBe('management');
    const movedFrom = [before.a, before.b].find((p) => p !== fixedEnd)!;
    const movedTo = [after.a, after.b].find((p) => p !== fixedEnd)!;
    expect(ownerName(i1, movedFrom)).toBe('fab-b');
    expect(ownerName(i2, movedTo)).toBe('oob-1');
    const field = before.a === fixedEnd ? 'b' : 'a';
    expect(diff.cables.changed).toEqual([
      { id: after.id, name: after.label, changes: [{ field, before: label(i1, movedFrom), after: label(i2, movedTo) }] },
    ]);
  });

  it('turns on the CHAP mode version 2 carries and changes nothing else', () => {
    expect(diff.document).toEqual([{ field: 'security.chap', before: v1.security?.chap ?? 'none', after: v2.security?.chap ?? 'none' }]);
    expect(v2.security?.chap).toBe('mutual'); // RFC 7143 §12.1.3, CHAP in both directions — from memory
    for (const section of ['devices', 'groups', 'ports', 'networks', 'addresses'] as const) {
      expect(diff.counts[section]).toEqual({ added: 0, removed: 0, changed: 0 });
    }
    expect(diff.cables.removed).toEqual([]);
    expect(diff.counts.total).toBe(3);
    expect(diff.layoutMoved).toBe(0);
    expect(diff.empty).toBe(false);
  });

  it('reads the same the other way round: version 2 to version 1 removes the cable and moves the port back', () => {
    const back = diffTopologies(v2, v1);
    expect(back.cables.removed.map((c) => c.id)).toEqual(diff.cables.added.map((c) => c.id));
    expect(back.cables.changed[0].changes.map(({ field, before, after }) => ({ field, before: after, after: before }))).toEqual(diff.cables.changed[0].changes);
  });
});
