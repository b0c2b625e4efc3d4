import { LIMITS } from '@/shared/rules/limits';
import {
  DEFAULT_DEVICE_HEIGHT_U,
  DEFAULT_RACK_HEIGHT_U,
  DEFAULT_SITE,
  type Device,
  type Rack,
  type Topology,
} from '@/shared/topology/schema';

/**
 * Rack geometry for the rack view, the rack rules and the cable-length estimate. Units are counted
 * from the bottom of the rack, 1-based (docs/topology-format.md); 1U = 1.75 in = 44.45 mm (EIA-310-D /
 * IEC 60297). Everything the format leaves optional falls back to the format's defaults here, and
 * only here, so a document is never rewritten to hold them.
 */
export const RACK_UNIT_MM = LIMITS.rackUnitMm.value;

export type ResolvedSite = { rackPitchMm: number; rowPitchMm: number; slackM: number };

export function resolvedSite(doc: Pick<Topology, 'site'>): ResolvedSite {
  return {
    rackPitchMm: doc.site?.rackPitchMm ?? DEFAULT_SITE.rackPitchMm,
    rowPitchMm: doc.site?.rowPitchMm ?? DEFAULT_SITE.rowPitchMm,
    slackM: doc.site?.slackM ?? DEFAULT_SITE.slackM,
  };
}

export function rackHeightU(rack: Rack): number {
  return rack.heightU ?? DEFAULT_RACK_HEIGHT_U;
}

/** The units a placed device fills: its placement's height, or its kind's default (array 2, switch 1, host 1). */
export function deviceHeightU(device: Device): number {
  return device.placement?.heightU ?? DEFAULT_DEVICE_HEIGHT_U[device.kind];
}

/** The lowest and highest unit a placed device fills, inclusive; null for an unplaced device. */
export function occupiedUnits(device: Device): { bottom: number; top: number } | null {
  if (!device.placement) return null;
  const bottom = device.placement.ru;
  return { bottom, top: bottom + deviceHeightU(device) - 1 };
}

/** "U40", or "U7–U8" for a device two units tall. */
export function unitsText(device: Device): string {
  const units = occupiedUnits(device);
  if (!units) return '';
  return units.top === units.bottom ? `U${units.bottom}` : `U${units.bottom}–U${units.top}`;
}

/**
 * Height of a device's ports above the bottom of its rack, in millimetres: the middle of the units
 * it fills (ports sit somewhere on its face; the middle is the fair guess for a tall device).
 * EIA-310: unit n spans (n − 1) × 44.45 mm to n × 44.45 mm.
 */
export function portHeightMm(device: Device): number | null {
  if (!device.placement) return null;
  return (device.placement.ru - 1 + deviceHeightU(device) / 2) * RACK_UNIT_MM;
}

/** Natural order of row names ("A" < "B", "2" < "10"), the same everywhere (no locale). */
export function compareRowNames(a: string, b: string): number {
  const numA = /^\d+$/.test(a) ? Number(a) : NaN;
  const numB = /^\d+$/.test(b) ? Number(b) : NaN;
  if (!Number.isNaN(numA) && !Number.isNaN(numB)) return numA - numB;
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * Each row name's place among the design's rows, in natural order: rows are taken to stand one row
 * pitch apart in that order (row A, then B, …). A rack without a row is in the unnamed row.
 */
export function rowRanks(racks: readonly Rack[]): Map<string, number> {
  const names = [...new Set(racks.map((r) => r.row ?? ''))].sort(compareRowNames);
  return new Map(names.map((name, i) => [name, i]));
}

/**
 * Floor distance between two racks in millimetres: along the row |Δposition| × rack pitch, across
 * rows |Δrow rank| × row pitch (an aisle-and-row walk, not a straight line: cables follow trays).
 * Null when it cannot be known — a rack without a position, in a different rack from the other end.
 */
export function rackDistanceMm(a: Rack, b: Rack, site: ResolvedSite, ranks: Map<string, number>): number | null {
  if (a.id === b.id) return 0;
  if (a.position === undefined || b.position === undefined) return null;
  const rows = Math.abs((ranks.get(a.row ?? '') ?? 0) - (ranks.get(b.row ?? '') ?? 0));
  return Math.abs(a.position - b.position) * site.rackPitchMm + rows * site.rowPitchMm;
}
