import type { HostArrayResult, Report } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';

/**
 * What a simulated failure does to each host's access to each array, compared with the report
 * without it: `lost` — no session left (the host is cut off); `reduced` — still reaches the array
 * but with fewer sessions, fewer controllers or no longer redundant; `unchanged` otherwise.
 */
export type PairImpact = {
  host: string;
  array: string;
  effect: 'lost' | 'reduced' | 'unchanged';
  before: HostArrayResult;
  after: HostArrayResult | null;
};

function pairKey(pair: { host: string; array: string }): string {
  return tupleKey([pair.host, pair.array]);
}

export function compareAccess(baseline: Report, simulated: Report): PairImpact[] {
  const after = new Map(simulated.hosts.map((pair) => [pairKey(pair), pair]));
  return baseline.hosts.map((before) => {
    const now = after.get(pairKey(before)) ?? null;
    const effect: PairImpact['effect'] = !now || now.sessions === 0
      ? 'lost'
      : now.sessions < before.sessions || now.controllersReached.length < before.controllersReached.length || (before.redundant && !now.redundant)
        ? 'reduced'
        : 'unchanged';
    return { host: before.host, array: before.array, effect, before, after: now };
  });
}

/** The hosts cut off from at least one array they reached before: the simulation's headline. */
export function hostsLosingAccess(impacts: readonly PairImpact[]): string[] {
  return [...new Set(impacts.filter((i) => i.effect === 'lost').map((i) => i.host))];
}
