import { analyze } from '@/shared/analysis/analyze';
import type { Report } from '@/shared/analysis/types';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { TopologyV1 } from '@/shared/topology/format1';
import { TOPOLOGY_FORMAT, TOPOLOGY_FORMAT_1, type Topology } from '@/shared/topology/schema';
import { upgradeTopology } from '@/shared/topology/upgrade';
import { validateTopology } from '@/shared/topology/validate';
import oldV1 from './data/harbor-road-v1.format-1.json';
import oldV2 from './data/harbor-road-v2.format-1.json';
import { mulberry32, randomDesign } from './helpers/random-design';

/**
 * Format 1 → format 2 on read (docs/topology-format.md). The format 1 files under tests/shared/data are
 * the Harbor Road demo as it was stored before format 2, kept to prove old versions still open.
 */
function v1(doc: object): TopologyV1 {
  return structuredClone(doc) as TopologyV1;
}

/** The rules only format 2 can trigger: a format 1 document has no racks to check. */
const RACK_RULES = new Set(['rack-units-overlap', 'device-above-rack-top', 'cable-shorter-than-estimate', 'cable-estimate-beyond-reach']);
const withoutRackRules = (report: Report): Report => ({ ...report, findings: report.findings.filter((f) => !RACK_RULES.has(f.rule)) });

/** A random design written as format 1, with racks and units sprinkled on (some with only one of the two). */
function randomV1(seed: number): TopologyV1 {
  const rnd = mulberry32(seed * 7 + 1);
  const doc = randomDesign(seed) as unknown as TopologyV1;
  doc.format = TOPOLOGY_FORMAT_1;
  for (const device of doc.devices) {
    const r = rnd();
    if (r < 0.4) Object.assign(device, { rack: `R${Math.floor(rnd() * 3)}`, ru: 1 + Math.floor(rnd() * 42) });
    else if (r < 0.5) device.rack = 'R0';
    else if (r < 0.6) device.ru = 7;
  }
  return doc;
}

describe('upgrading format 1 documents', () => {
  it('makes one rack per distinct rack name, in order of first use, and places devices that had rack and unit', () => {
    const doc = v1({
      format: TOPOLOGY_FORMAT_1,
      name: 'old room',
      devices: [
        { id: 'sw', kind: 'switch', name: 'sw', role: 'data', ports: [], rack: 'Row 2 / 07', ru: 40 },
        { id: 'arr', kind: 'array', name: 'arr', controllers: [{ id: 'arr.a', name: 'a', ports: [] }], rack: 'A01', ru: 10 },
        { id: 'h1', kind: 'host', name: 'h1', adapters: [], rack: 'A01', ru: 20 },
        { id: 'h2', kind: 'host', name: 'h2', adapters: [], rack: 'A01' },
        { id: 'h3', kind: 'host', name: 'h3', adapters: [], ru: 5 },
        { id: 'rk-a01', kind: 'host', name: 'taken', adapters: [] },
      ],
      cables: [],
      networks: [],
    });
    const up = upgradeTopology(doc);
    expect(up.format).toBe(TOPOLOGY_FORMAT);
    expect(up.racks).toEqual([
      { id: 'rk-row-2-07', name: 'Row 2 / 07', heightU: 42 }, // 42U: the format's default rack height
      { id: 'rk-a01-2', name: 'A01', heightU: 42 }, // rk-a01 is already a device's id
    ]);
    expect(up.devices.map((d) => [d.id, d.placement ?? null])).toEqual([
      ['sw', { rackId: 'rk-row-2-07', ru: 40, heightU: 1 }], // the format's default heights: switch 1U,
      ['arr', { rackId: 'rk-a01-2', ru: 10, heightU: 2 }], // array 2U,
      ['h1', { rackId: 'rk-a01-2', ru: 20, heightU: 1 }], // host 1U
      ['h2', null],
      ['h3', null],
      ['rk-a01', null],
    ]);
    expect(up.devices.some((d) => 'rack' in d || 'ru' in d)).toBe(false);
    expect(validateTopology(up)).toMatchObject({ ok: true, from: 2 });
  });

  it('is what the gate answers for a format 1 document, and leaves its input alone', () => {
    const doc = v1(oldV2);
    const before = JSON.stringify(doc);
    const checked = validateTopology(doc);
    expect(checked).toEqual({ ok: true, doc: upgradeTopology(v1(oldV2)), from: 1 });
    expect(JSON.stringify(doc)).toBe(before);
  });

  it('gives the stored Harbor Road versions the same analysis as before, and as the demo in racks', () => {
    for (const [old, now] of [[oldV1, harborRoadV1()], [oldV2, harborRoadV2()]] as const) {
      const checked = validateTopology(v1(old));
      if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
      // The analysis as it read format 1: the very same document, racks or no racks.
      expect(analyze(checked.doc)).toEqual(analyze(old as unknown as Topology));
      // The demo now stands in racks A01 and A02; nothing about its paths, addresses or cables changed.
      expect(analyze(now)).toEqual(analyze(checked.doc));
    }
  });

  it('keeps every analysis result of 200 random format 1 designs', () => {
    for (let seed = 1; seed <= 200; seed += 1) {
      const doc = randomV1(seed);
      const checked = validateTopology(structuredClone(doc));
      if (!checked.ok) throw new Error(`seed ${seed}: ${JSON.stringify(checked.issues)}`);
      expect(withoutRackRules(analyze(checked.doc))).toEqual(analyze(doc as unknown as Topology));
    }
  });

  it('reports a format 1 document’s problems at its own paths and in format 1 words', () => {
    const doc = v1(oldV1) as unknown as Record<string, any>;
    doc.devices[4].rack = 7;
    doc.devices[5].placement = { rackId: 'x', ru: 1 };
    const checked = validateTopology(doc);
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.issues).toEqual([
      { path: 'devices.4.rack', message: 'The rack must be text.' },
      { path: 'devices.5.placement', message: '"placement" is not a field of this object in format 1; remove it.' },
    ]);
  });
});
