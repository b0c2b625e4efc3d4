import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { lowestFreeUnit } from '@/shared/racks/occupancy';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { Draft } from './helpers/draft';

/**
 * Rack drafting mistakes are findings, never refusals (docs/topology-format.md, format 2). Units are
 * EIA-310 units from the bottom, 1-based; a rack has 42 unless it says otherwise.
 *
 *   rack R (42U): v U20–21 (2U array) ; h1 U21 ; h2 U22 ; fa U42 ; fb U42–43 (2U switch)
 */
function crowded(): Topology {
  return new Draft()
    .array('v', { a: 1 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1 })
    .host('h2', { c1: 1 })
    .rack('R')
    .place('v', 'R', 20, 2)
    .place('h1', 'R', 21)
    .place('h2', 'R', 22)
    .place('fa', 'R', 42)
    .place('fb', 'R', 42, 2)
    .build();
}

const rackFindings = (doc: Topology) => analyze(doc).findings.filter((f) => f.rule === 'rack-units-overlap' || f.rule === 'device-above-rack-top');

describe('rack findings', () => {
  it('are drafting mistakes: the document with them is still valid', () => {
    expect(validateTopology(crowded()).ok).toBe(true);
  });

  it('name two devices in the same units, with the units they share', () => {
    const overlaps = rackFindings(crowded()).filter((f) => f.rule === 'rack-units-overlap');
    expect(overlaps).toEqual([
      { rule: 'rack-units-overlap', severity: 'error', subjects: ['fb', 'fa', 'R'], message: 'fb (U42–U43) and fa (U42) both take unit 42 of rack R; move one of them.' },
      { rule: 'rack-units-overlap', severity: 'error', subjects: ['h1', 'v', 'R'], message: 'h1 (U21) and v (U20–U21) both take unit 21 of rack R; move one of them.' },
    ]);
  });

  it('name a device reaching above the top of its rack', () => {
    const above = rackFindings(crowded()).filter((f) => f.rule === 'device-above-rack-top');
    expect(above).toEqual([
      { rule: 'device-above-rack-top', severity: 'error', subjects: ['fb', 'R'], message: 'fb (U42–U43) reaches above the top of rack R, which has 42 units.' },
    ]);
    const tall = crowded();
    tall.racks![0].heightU = 48;
    expect(rackFindings(tall).map((f) => f.rule)).toEqual(['rack-units-overlap', 'rack-units-overlap']);
  });

  it('say nothing of devices stacked edge to edge, or of the same units in different racks', () => {
    const doc = new Draft().array('v', { a: 1 }).switch('fa').host('h1', { c1: 1 }).rack('R').rack('S')
      .place('v', 'R', 1, 2).place('h1', 'R', 3).place('fa', 'S', 1).build();
    expect(rackFindings(doc)).toEqual([]);
  });

  it('report a pile of devices in one unit once per device, not once per pair', () => {
    const d = new Draft().rack('R');
    for (let i = 0; i < 200; i += 1) d.host(`h${i}`, {}).place(`h${i}`, 'R', 5);
    expect(rackFindings(d.build())).toHaveLength(199);
  });

  it('are none on the demo, where every device has units of its own', () => {
    expect(rackFindings(harborRoadV1())).toEqual([]);
    expect(rackFindings(harborRoadV2())).toEqual([]);
  });
});

describe('the lowest free unit of a rack', () => {
  it('skips the units others fill and the device being moved frees its own', () => {
    const doc = crowded();
    expect(lowestFreeUnit(doc, 'R', 1)).toBe(1);
    const low = new Draft().host('a', {}).host('b', {}).rack('R', { heightU: 4 }).place('a', 'R', 1).place('b', 'R', 3).build();
    expect(lowestFreeUnit(low, 'R', 1)).toBe(2);
    expect(lowestFreeUnit(low, 'R', 2)).toBeNull(); // units 1 and 3 taken in a 4U rack: no two free in a row
    expect(lowestFreeUnit(low, 'R', 2, 'b')).toBe(2);
    expect(lowestFreeUnit(low, 'nowhere', 1)).toBeNull();
  });
});
