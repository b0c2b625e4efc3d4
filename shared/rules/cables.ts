import { MEDIA_CONNECTOR, REACH, type Reach } from '@/shared/rules/limits';
import type { Media } from '@/shared/topology/schema';

/** Cable rules for the analysis and the cable schedule, read from the limits table. */
export function reachOf(media: Media, speedGbps: number): Reach | null {
  return REACH.find((entry) => entry.media === media && entry.speedGbps === speedGbps) ?? null;
}

/** The speeds a medium can carry at all, lowest first. */
export function speedsFor(media: Media): number[] {
  return REACH.filter((entry) => entry.media === media).map((entry) => entry.speedGbps).sort((a, b) => a - b);
}

export function connectorFor(media: Media): 'rj45' | 'sfp' {
  return MEDIA_CONNECTOR[media];
}

/** A link runs at the lower of its two ends' speeds. */
export function linkSpeed(a: number, b: number): number {
  return Math.min(a, b);
}
