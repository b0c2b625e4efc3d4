import { occupiedUnits, rackHeightU } from '@/shared/racks/geometry';
import type { Device, Rack, Topology } from '@/shared/topology/schema';

/**
 * What each rack holds, for the rack view and the rack rules: the placed devices of each rack,
 * lowest first, and the two drafting mistakes the format names — two devices in the same units,
 * and a device reaching above the top of its rack. Both are findings, never refusals.
 */
export type Occupant = { device: Device; bottom: number; top: number };
export type RackContents = { rack: Rack; occupants: Occupant[] };

/** A device whose units run into those of one placed lower down (`under`), and the units they share. */
export type UnitClash = { rack: Rack; under: Occupant; over: Occupant; from: number; to: number };

export function rackContents(doc: Pick<Topology, 'racks' | 'devices'>): RackContents[] {
  const contents = (doc.racks ?? []).map((rack): RackContents => ({ rack, occupants: [] }));
  const byId = new Map(contents.map((entry) => [entry.rack.id, entry]));
  for (const device of doc.devices) {
    const units = occupiedUnits(device);
    const entry = device.placement && byId.get(device.placement.rackId);
    if (units && entry) entry.occupants.push({ device, ...units });
  }
  for (const entry of contents) entry.occupants.sort((x, y) => x.bottom - y.bottom || x.top - y.top);
  return contents;
}

/**
 * Every device that runs into a lower one, each reported once against the lower device reaching
 * highest: one sweep per rack, so a pile of a thousand devices in one unit gives a thousand
 * findings, not half a million pairs.
 */
export function unitClashes(contents: readonly RackContents[]): UnitClash[] {
  const clashes: UnitClash[] = [];
  for (const { rack, occupants } of contents) {
    let highest: Occupant | null = null;
    for (const occupant of occupants) {
      if (highest && occupant.bottom <= highest.top) {
        clashes.push({ rack, under: highest, over: occupant, from: occupant.bottom, to: Math.min(occupant.top, highest.top) });
      }
      if (!highest || occupant.top > highest.top) highest = occupant;
    }
  }
  return clashes;
}

/** Devices whose top unit is above the rack's height. */
export function aboveTop(contents: readonly RackContents[]): { rack: Rack; occupant: Occupant }[] {
  const out: { rack: Rack; occupant: Occupant }[] = [];
  for (const { rack, occupants } of contents) {
    const height = rackHeightU(rack);
    for (const occupant of occupants) if (occupant.top > height) out.push({ rack, occupant });
  }
  return out;
}

/**
 * The lowest unit of a rack where `heightU` units are free and inside the rack, ignoring the device
 * `except` (the one being moved); null when nothing fits. For placing a device by choosing a rack.
 */
export function lowestFreeUnit(doc: Pick<Topology, 'racks' | 'devices'>, rackId: string, heightU: number, except?: string): number | null {
  const entry = rackContents(doc).find((c) => c.rack.id === rackId);
  if (!entry) return null;
  const height = rackHeightU(entry.rack);
  const taken = entry.occupants.filter((o) => o.device.id !== except);
  for (let bottom = 1; bottom + heightU - 1 <= height; bottom += 1) {
    const top = bottom + heightU - 1;
    if (!taken.some((o) => o.bottom <= top && o.top >= bottom)) return bottom;
  }
  return null;
}

