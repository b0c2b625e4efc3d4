import { MEDIA_CONNECTOR, REACH, type Reach } from '@/shared/rules/limits';
import type { Media } from '@/shared/topology/schema';

/** Cable rules for the analysis and the cable schedule, read from the limits table. */
const REACH_BY_MEDIA = new Map<Media, Map<number, Reach>>();
for (const entry of REACH) {
  let bySpeed = REACH_BY_MEDIA.get(entry.media);
  if (!bySpeed) REACH_BY_MEDIA.set(entry.media, (bySpeed = new Map()));
  bySpeed.set(entry.speedGbps, entry);
}

export function reachOf(media: Media, speedGbps: number): Reach | null {
  return REACH_BY_MEDIA.get(media)?.get(speedGbps) ?? null;
}

/** The speeds a medium can carry at all, lowest first. */
export function speedsFor(media: Media): number[] {
  return REACH.filter((entry) => entry.media === media).map((entry) => entry.speedGbps).sort((a, b) => a - b);
}

export function connectorFor(media: Media): 'rj45' | 'sfp' {
  return MEDIA_CONNECTOR[media];
}

/** Media as the trade writes them, for messages. */
export const MEDIA_NAMES: Record<Media, string> = {
  cat5e: 'Category 5e',
  cat6: 'Category 6',
  cat6a: 'Category 6A',
  om3: 'OM3 fibre',
  om4: 'OM4 fibre',
  dac: 'direct-attach copper',
  aoc: 'active optical cable',
};

/** A link runs at the lower of its two ends' speeds. */
export function linkSpeed(a: number, b: number): number {
  return Math.min(a, b);
}
