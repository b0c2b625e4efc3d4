import { analyze } from '@/shared/analysis/analyze';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from '../helpers/draft';

/**
 * Cable lengths against the racks (site defaults: 600 mm rack pitch, 1200 mm row pitch, 0.5 m slack).
 *
 *   A01 (row A, 1): sw U40        A02 (row A, 2): h U7        Z150 (row Z, 150): far U40
 *   (rows A and Z are the design's only rows, so they stand one row pitch apart)
 *   h.c1.1 == sw (k1) ; far.c1.1 == sw (k2)
 */
type CableChoice = Partial<{ lengthM: number; media: 'cat6' | 'cat6a' }>;

function room(k1: CableChoice, k2: CableChoice = {}): Topology {
  return new Draft()
    .switch('sw')
    .host('h', { c1: 1 })
    .host('far', { c1: 1 })
    .rack('A01', { row: 'A', position: 1 })
    .rack('A02', { row: 'A', position: 2 })
    .rack('Z150', { row: 'Z', position: 150 })
    .place('sw', 'A01', 40)
    .place('h', 'A02', 7)
    .place('far', 'Z150', 40)
    .link('h.c1.1', 'sw', k1)
    .link('far.c1.1', 'sw', { lengthM: 95, ...k2 })
    .build();
}

const about = (doc: Topology, rule: string) => analyze(doc).findings.filter((f) => f.rule === rule);

describe('length findings', () => {
  it('warn when the chosen length is shorter than the estimate', () => {
    // k1's estimate: 33U × 44.45 mm (EIA-310) = 1.46685 m + 0.6 m + 0.5 m = 2.57 m.
    const short = about(room({ lengthM: 2 }), 'cable-shorter-than-estimate');
    expect(short).toEqual([
      { rule: 'cable-shorter-than-estimate', severity: 'warning', subjects: ['k1'], message: 'Cable k1 is 2 m, shorter than the 2.57 m its ends\' rack positions call for.' },
    ]);
    expect(about(room({ lengthM: 2.57 }), 'cable-shorter-than-estimate')).toEqual([]);
    expect(about(room({ lengthM: 3 }), 'cable-shorter-than-estimate')).toEqual([]);
  });

  it('warn when the estimate is past the reach of the media at the link speed', () => {
    // k2 runs 149 pitches along and one row across: 89.4 m + 1.2 m + 0.5 m = 91.1 m — fine on
    // Category 6A at 10G (100 m, IEEE 802.3an), past Category 6's 55 m at 10G (IEEE 802.3an; TIA TSB-155).
    expect(about(room({}, { media: 'cat6a', lengthM: 95 }), 'cable-estimate-beyond-reach')).toEqual([]);
    const beyond = about(room({}, { media: 'cat6', lengthM: 50 }), 'cable-estimate-beyond-reach');
    expect(beyond).toHaveLength(1);
    expect(beyond[0]).toMatchObject({ severity: 'warning', subjects: ['k2'] });
    expect(beyond[0].message).toContain('needs about 91.1 m between its racks, beyond the 55 m Category 6 reaches at 10 Gb/s');
  });

  it('leave a chosen length past the reach to cable-too-long', () => {
    const doc = room({}, { media: 'cat6', lengthM: 95 });
    expect(about(doc, 'cable-estimate-beyond-reach')).toEqual([]);
    expect(about(doc, 'cable-too-long').map((f) => f.subjects)).toEqual([['k2']]);
  });

  it('say nothing when an end is not placed', () => {
    const doc = room({ lengthM: 0.5 });
    delete doc.devices.find((d) => d.id === 'h')!.placement;
    expect(about(doc, 'cable-shorter-than-estimate')).toEqual([]);
  });
});
