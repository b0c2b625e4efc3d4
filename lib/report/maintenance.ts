import type { AfterOneResult, ExposedPair, HostArrayPair, Report } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';

/**
 * The maintenance view's rows, read from afterOneFailure: "take down X: these hosts are exposed
 * through Y". One row per unit, the units that expose the most hosts first (then those that cut the
 * most off, then by id). Each exposed pair says whether it was already exposed before X went down,
 * so the view can tell what the maintenance itself puts at risk from what was at risk anyway.
 */
export type ExposedRow = ExposedPair & { already: boolean };

export type MaintenanceRow = {
  unit: string;
  /** Distinct hosts exposed (left with a single point of failure) while the unit is down. */
  hostsExposed: number;
  /** Of those, hosts that were redundant before. */
  hostsNewlyExposed: number;
  exposed: ExposedRow[];
  cutOff: HostArrayPair[];
};

function distinctHosts(pairs: readonly { host: string }[]): number {
  return new Set(pairs.map((p) => p.host)).size;
}

export function maintenanceRows(afterOne: readonly AfterOneResult[], baseline: Report): MaintenanceRow[] {
  const exposedBefore = new Set(baseline.hosts.filter((p) => !p.redundant).map((p) => tupleKey([p.host, p.array])));
  const rows = afterOne.map((entry): MaintenanceRow => {
    const exposed = entry.exposed.map((pair) => ({ ...pair, already: exposedBefore.has(tupleKey([pair.host, pair.array])) }));
    return {
      unit: entry.failed,
      hostsExposed: distinctHosts(exposed),
      hostsNewlyExposed: distinctHosts(exposed.filter((p) => !p.already)),
      exposed,
      cutOff: entry.cutOff,
    };
  });
  return rows.sort(
    (x, y) =>
      y.hostsExposed - x.hostsExposed ||
      y.cutOff.length - x.cutOff.length ||
      (x.unit < y.unit ? -1 : x.unit > y.unit ? 1 : 0),
  );
}

/** Pairs of a simulated report left with a single point of failure: the exposure after the chosen failures. */
export function exposureOf(report: Report): ExposedPair[] {
  return report.hosts.filter((p) => !p.redundant).map((p) => ({ host: p.host, array: p.array, singlePointsOfFailure: p.singlePointsOfFailure }));
}
