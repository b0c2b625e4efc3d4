import { portHeightMm, rackDistanceMm, resolvedSite, rowRanks } from '@/shared/racks/geometry';
import type { Device, Rack, Topology } from '@/shared/topology/schema';

/**
 * The cable-length estimate from where the two devices sit (a model, documented so people can
 * check it by hand):
 *
 *   estimate = |h(a) − h(b)| + floor distance between the racks + slack
 *
 * - h(x) is the height of a device's ports above the bottom of its rack: the middle of the units it
 *   fills, with 1U = 44.45 mm (EIA-310-D). So two 1U devices at U40 and U7 are 33U = 1.467 m apart.
 * - The floor distance runs along the row, |Δposition| × `rackPitchMm`, and across rows,
 *   |Δrow| × `rowPitchMm`, rows taken one pitch apart in their natural order (A, B, C…). Same rack: 0.
 * - `slackM` (default 0.5 m) is added once per cable for dressing, service loops and the way in
 *   and out of the tray.
 * - No estimate (null) when an end is unplaced, or the two racks' distance is unknown (a rack
 *   without a position, when the ends are in different racks).
 *
 * Estimates are rounded up to the next centimetre, so rounding never makes a cable too short.
 * Stock lengths round up again, to the usual patch-cord sizes (common practice).
 */
export const STOCK_LENGTHS_M = [0.5, 1, 1.5, 2, 3, 5, 7, 10, 15, 20, 30, 50] as const;

export type LengthEstimator = (a: Device, b: Device) => number | null;

export function lengthEstimator(doc: Pick<Topology, 'site' | 'racks'>): LengthEstimator {
  const racks = doc.racks ?? [];
  const byId = new Map<string, Rack>(racks.map((rack) => [rack.id, rack]));
  const site = resolvedSite(doc);
  const ranks = rowRanks(racks);
  return (a, b) => {
    const rackA = a.placement && byId.get(a.placement.rackId);
    const rackB = b.placement && byId.get(b.placement.rackId);
    if (!rackA || !rackB) return null;
    const floor = rackDistanceMm(rackA, rackB, site, ranks);
    if (floor === null) return null;
    const vertical = Math.abs(portHeightMm(a)! - portHeightMm(b)!);
    return roundUpToCentimetre((vertical + floor) / 1000 + site.slackM);
  };
}

export function roundUpToCentimetre(metres: number): number {
  // The small tolerance keeps 1.5 from becoming 1.51 through binary fractions (1.5000000000000002).
  return Math.ceil(metres * 100 - 1e-6) / 100;
}

/** The shortest stock patch cord at least `metres` long; null past the longest (50 m) or for no length. */
export function stockLength(metres: number | null | undefined): number | null {
  if (metres === null || metres === undefined) return null;
  for (const stock of STOCK_LENGTHS_M) if (stock >= metres - 1e-9) return stock;
  return null;
}
