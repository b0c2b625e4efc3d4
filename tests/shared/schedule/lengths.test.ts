import { cableSchedule, lengthEstimator, stockLength, STOCK_LENGTHS_M } from '@/shared/schedule';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from '../helpers/draft';

/**
 * Length estimates checked by hand on drawn rooms. Site defaults (docs/topology-format.md): racks 600 mm
 * apart centre to centre, rows 1200 mm apart, 0.5 m slack per cable.
 *
 *   row A:  A01 (position 1)   A02 (position 2)   A05 (position 5)
 *   row B:  B01 (position 1)
 *   R? (no row, no position)
 *
 *   sw (1U) ==p12== h (1U, card c1 port 1); v (2U array) == sw
 */
function room(): Draft {
  return new Draft()
    .array('v', { a: 1 })
    .switch('sw', 'data', 12)
    .host('h', { c1: 1 })
    .rack('A01', { row: 'A', position: 1 })
    .rack('A02', { row: 'A', position: 2 })
    .rack('A05', { row: 'A', position: 5 })
    .rack('B01', { row: 'B', position: 1 })
    .rack('R?');
}

function estimate(doc: Topology, a: string, b: string): number | null {
  const find = (id: string) => doc.devices.find((d) => d.id === id)!;
  return lengthEstimator(doc)(find(a), find(b));
}

describe('the cable-length estimate', () => {
  it('in one rack is the vertical run between the middles of the two devices plus slack', () => {
    const doc = room().place('sw', 'A01', 40).place('h', 'A01', 7).place('v', 'A01', 12, 2).build();
    // EIA-310: 1U = 44.45 mm. sw fills U40, middle 39.5U up; h fills U7, middle 6.5U: 33U = 1466.85 mm.
    // 1.46685 m + 0.5 m slack = 1.96685 m, rounded up to the centimetre.
    expect(estimate(doc, 'sw', 'h')).toBe(1.97);
    // EIA-310: 1U = 44.45 mm. v fills U12–U13, middle 12U up: 27.5U = 1222.375 mm; + 0.5 m = 1.722375 m.
    expect(estimate(doc, 'sw', 'v')).toBe(1.73);
  });

  it('between neighbouring racks adds one rack pitch', () => {
    const doc = room().place('sw', 'A01', 40).place('h', 'A02', 7).build();
    // EIA-310: 1U = 44.45 mm. 33U = 1.46685 m up, 0.6 m across (one 600 mm pitch), 0.5 m slack = 2.56685 m.
    expect(estimate(doc, 'sw', 'h')).toBe(2.57);
    const far = room().place('sw', 'A01', 40).place('h', 'A05', 40).build();
    // Same height; four pitches along the row: 4 × 0.6 m + 0.5 m = 2.9 m.
    expect(estimate(far, 'sw', 'h')).toBe(2.9);
  });

  it('into another row adds the row pitch to the run along the row', () => {
    const doc = room().place('sw', 'A05', 40).place('h', 'B01', 7).build();
    // EIA-310: 1U = 44.45 mm. 33U = 1.46685 m; along the row 4 × 0.6 m = 2.4 m; one row over 1.2 m;
    // slack 0.5 m: 5.56685 m.
    expect(estimate(doc, 'sw', 'h')).toBe(5.57);
  });

  it('follows the site’s own pitches and slack', () => {
    const doc = room().place('sw', 'A01', 40).place('h', 'B01', 40).build();
    doc.site = { rackPitchMm: 800, rowPitchMm: 2400, slackM: 1 };
    // Same unit, same position, one row over: 2.4 m + 1 m slack.
    expect(estimate(doc, 'sw', 'h')).toBe(3.4);
  });

  it('gives no estimate for an unplaced end, or between racks whose distance is unknown', () => {
    expect(estimate(room().place('sw', 'A01', 40).build(), 'sw', 'h')).toBeNull();
    const doc = room().place('sw', 'A01', 40).place('h', 'R?', 10).build();
    expect(estimate(doc, 'sw', 'h')).toBeNull();
    // Within the rack without a position the distance is known: 30U of EIA-310's 44.45 mm = 1.3335 m + 0.5 m.
    const same = room().place('sw', 'R?', 40).place('h', 'R?', 10).build();
    expect(estimate(same, 'sw', 'h')).toBe(1.84);
  });
});

describe('stock lengths', () => {
  it('are the usual patch-cord sizes', () => {
    expect(STOCK_LENGTHS_M).toEqual([0.5, 1, 1.5, 2, 3, 5, 7, 10, 15, 20, 30, 50]); // common practice
  });

  it('round a length up to the next stock size, and give none past 50 m', () => {
    expect([0.2, 0.5, 0.51, 1.97, 2, 2.57, 3, 7.01, 49.9, 50].map(stockLength)).toEqual([0.5, 0.5, 1, 2, 2, 3, 3, 10, 50, 50]); // common practice sizes
    expect(stockLength(50.01)).toBeNull();
    expect(stockLength(null)).toBeNull();
  });

  it('come from the chosen length when there is one, else from the estimate', () => {
    const doc = room().place('sw', 'A01', 40).place('h', 'A02', 7).link('h.c1.1', 'sw').link('v.a.1', 'sw', { lengthM: undefined }).build();
    delete doc.cables[1].lengthM;
    const rows = new Map(cableSchedule(doc).cables.map((r) => [r.id, r]));
    // k1: chosen 3 m (the draft's default), estimate 2.57 m (neighbouring racks, above): stock 3 m.
    expect(rows.get('k1')).toMatchObject({ lengthM: 3, estimatedLengthM: 2.57, stockLengthM: 3 });
    // k2: no length, v unplaced: nothing to go by.
    expect(rows.get('k2')).toMatchObject({ lengthM: null, estimatedLengthM: null, stockLengthM: null });
  });
});
