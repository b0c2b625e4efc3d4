import type { AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { rackHeightU } from '@/shared/racks/geometry';
import { aboveTop, rackContents, unitClashes, type Occupant } from '@/shared/racks/occupancy';
import { displayName } from '@/shared/topology/index';

/**
 * Rack drafting mistakes (docs/topology-format.md, format 2): two devices in the same rack units, and a
 * device reaching above the top of its rack. Findings rather than refusals, so a half-placed draft
 * can be saved; both stop the build as drawn, so both are errors. Units follow EIA-310: counted from
 * the bottom, 1-based.
 */
function units(from: number, to: number): string {
  return from === to ? `unit ${from}` : `units ${from}–${to}`;
}

function span(occupant: Occupant): string {
  return occupant.bottom === occupant.top ? `U${occupant.bottom}` : `U${occupant.bottom}–U${occupant.top}`;
}

export function rackFindings(ctx: AnalysisContext): Finding[] {
  if (!ctx.doc.racks?.length) return [];
  const contents = rackContents(ctx.doc);
  const out: Finding[] = [];
  for (const clash of unitClashes(contents)) {
    const { rack, under, over } = clash;
    out.push({
      rule: 'rack-units-overlap',
      severity: 'error',
      subjects: [over.device.id, under.device.id, rack.id],
      message: `${displayName(over.device)} (${span(over)}) and ${displayName(under.device)} (${span(under)}) both take ${units(clash.from, clash.to)} of rack ${displayName(rack)}; move one of them.`,
    });
  }
  for (const { rack, occupant } of aboveTop(contents)) {
    out.push({
      rule: 'device-above-rack-top',
      severity: 'error',
      subjects: [occupant.device.id, rack.id],
      message: `${displayName(occupant.device)} (${span(occupant)}) reaches above the top of rack ${displayName(rack)}, which has ${rackHeightU(rack)} units.`,
    });
  }
  return out;
}
