import { analyze } from '@/shared/analysis/analyze';
import type { Report } from '@/shared/analysis/types';
import { canonicalJson } from '@/shared/topology/canonical';
import { withPositions } from '@/shared/topology/layout';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { failureUnits, bruteForceHosts } from './helpers/oracle';
import { randomDesign, randomFailures } from './helpers/random-design';
import { interSwitchLink, twoArrays, twoFabrics } from './helpers/topologies';
import {
  allHostile,
  BIDI_IDS,
  collidingIds,
  CONTROL_IDS,
  ID_KINDS,
  idsOf,
  overTheWire,
  PROTOTYPE_NAMES,
  renameIds,
  safeTwin,
  withIdOfKind,
} from './helpers/hostile';

/**
 * Documents an attacker would send. Whatever the ids hold — an Object.prototype member's name, a
 * control character, a bidirectional override, a separator that makes two ids read as one — the
 * analysis must give exactly what it gives for the same document with plain ids (mapped back),
 * and hosts[] must equal the brute-force oracle's on the hostile document itself.
 */
function valid(doc: Topology): Topology {
  const checked = validateTopology(overTheWire(doc));
  if (!checked.ok) throw new Error(`not valid: ${JSON.stringify(checked.issues.slice(0, 3))}`);
  return checked.doc;
}

/** The report of the hostile document and the one it must equal, both as JSON text. */
function reports(doc: Topology, failed: string[] = []): { actual: string; expected: string; report: Report } {
  const report = analyze(doc, { failed });
  const twin = safeTwin(doc);
  const expected = twin.back(analyze(twin.doc, { failed: failed.map(twin.to) }));
  return { actual: JSON.stringify(report), expected: JSON.stringify(expected), report };
}

function expectSameAsTwin(doc: Topology, label: string, failed: string[] = []) {
  const { actual, expected, report } = reports(doc, failed);
  if (actual !== expected) expect({ label, report: JSON.parse(actual) }).toEqual({ label, report: JSON.parse(expected) });
  const oracle = bruteForceHosts(doc, failed);
  if (JSON.stringify(report.hosts) !== JSON.stringify(oracle)) expect({ label, hosts: report.hosts }).toEqual({ label, hosts: oracle });
  return report;
}

const BASES: [string, () => Topology][] = [
  ['Harbor Road v1', harborRoadV1],
  ['Harbor Road v2', harborRoadV2],
  ['inter-switch link', interSwitchLink],
  ['two fabrics', () => twoFabrics().build()],
  ['two arrays', twoArrays],
];

describe('hostile documents', () => {
  it('lists every Object.prototype name among the hostile ids, __proto__ included', () => {
    expect(PROTOTYPE_NAMES).toEqual(expect.arrayContaining(['constructor', '__proto__', 'toString', 'valueOf', 'hasOwnProperty', 'isPrototypeOf']));
  });

  it.each(BASES)('gives %s the same report with any prototype name as the id of any kind of thing', (label, make) => {
    const base = valid(make());
    let compared = 0;
    for (const kind of ID_KINDS) {
      for (const name of PROTOTYPE_NAMES) {
        const doc = withIdOfKind(base, kind, name);
        if (!doc) continue;
        expectSameAsTwin(valid(doc), `${label}: ${kind} ${name}`);
        compared += 1;
      }
    }
    expect(compared).toBeGreaterThanOrEqual(PROTOTYPE_NAMES.length * 5);
  });

  it('covers every kind of thing with every prototype name across the bases', () => {
    const covered = new Set<string>();
    for (const [, make] of BASES) for (const kind of ID_KINDS) if (withIdOfKind(make(), kind, 'x')) covered.add(kind);
    expect([...covered].sort()).toEqual([...ID_KINDS].sort());
  });

  it('still finds the single points of failure of Harbor Road v1 when the switch is called constructor', () => {
    const doc = valid(withIdOfKind(harborRoadV1(), 'switch', 'constructor')!);
    const report = analyze(doc);
    expect(report.hosts).toHaveLength(6);
    expect(report.failures.map((f) => f.unit)).toContain('constructor');
    expect(report.findings.filter((f) => f.rule === 'host-unreachable')).toEqual([]);
  });

  it('gives the same report when every id of a random design is hostile, with and without failed units', () => {
    let pairs = 0;
    for (let seed = 1; seed <= 150; seed += 1) {
      const doc = valid(allHostile(randomDesign(seed), seed));
      pairs += expectSameAsTwin(doc, `seed ${seed}`).hosts.length;
      const failed = randomFailures(doc, seed, failureUnits(doc));
      expectSameAsTwin(doc, `seed ${seed} failing ${JSON.stringify(failed)}`, failed);
    }
    expect(pairs).toBeGreaterThan(100);
  });

  it('gives Harbor Road the same report when every one of its ids is hostile', () => {
    for (const [label, make] of BASES.slice(0, 2)) {
      for (let seed = 1; seed <= 5; seed += 1) expectSameAsTwin(valid(allHostile(make(), seed)), `${label} seed ${seed}`);
    }
  });

  it('keeps apart ids that read alike when joined with a separator', () => {
    const colliding = [...new Set([...collidingIds(), ...CONTROL_IDS, ...BIDI_IDS])];
    for (let seed = 1; seed <= 40; seed += 1) {
      const base = valid(randomDesign(seed + 500));
      const ids = idsOf(base).map((x) => x.id);
      const map = new Map(ids.map((id, i) => [id, colliding[i % colliding.length] + (i >= colliding.length ? `#${i}` : '')]));
      const doc = valid(renameIds(base, (id) => map.get(id) ?? id));
      expectSameAsTwin(doc, `colliding seed ${seed}`);
    }
  });

  it('keeps a layout keyed by prototype names, through validation and canonical JSON', () => {
    const base = harborRoadV2();
    const switchDoc = withIdOfKind(withIdOfKind(withIdOfKind(base, 'switch', '__proto__')!, 'switch', 'constructor', 1)!, 'host', 'toString')!;
    const layout: Record<string, { x: number; y: number }> = Object.create(null);
    switchDoc.devices.forEach((d, i) => (layout[d.id] = { x: i * 10, y: i }));
    const doc = valid({ ...switchDoc, layout });
    expect(Object.keys(doc.layout!)).toEqual(switchDoc.devices.map((d) => d.id));
    expect(Object.getPrototypeOf(doc.layout)).toBeNull();
    expect(Object.hasOwn(doc.layout!, '__proto__')).toBe(true);
    const at = switchDoc.devices.findIndex((d) => d.id === '__proto__');
    const expected = { x: at * 10, y: at };
    expect(doc.layout!['__proto__']).toEqual(expected);
    expect(JSON.parse(canonicalJson(doc)).layout.__proto__).toEqual(expected);
    expect(canonicalJson(doc)).toContain(`"__proto__":{"x":${at * 10},"y":${at}}`);
    // Moving only the device called __proto__ changes the text the content hash is taken from.
    expect(canonicalJson({ ...doc, layout: withPositions(doc.layout, [['__proto__', { x: 999, y: 0 }]]) })).not.toBe(canonicalJson(doc));
  });

  it('checks the position under a __proto__ layout key like any other', () => {
    const doc = withIdOfKind(harborRoadV2(), 'switch', '__proto__')!;
    const text = JSON.stringify({ ...doc, layout: { placeholder: 1 } }).replace('"placeholder":1', '"__proto__":{"x":"left","y":0}');
    const checked = validateTopology(JSON.parse(text));
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues).toEqual([{ path: 'layout.__proto__.x', message: 'The x position must be a number.' }]);
  });

  it('reports a layout key __proto__ that names no device', () => {
    const text = JSON.stringify({ ...harborRoadV2(), layout: { placeholder: 1 } }).replace('"placeholder":1', '"__proto__":{"x":1,"y":2}');
    const checked = validateTopology(JSON.parse(text));
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues).toEqual([{ path: 'layout.__proto__', message: 'The layout names "__proto__", which is not a device of this document.' }]);
  });
});
