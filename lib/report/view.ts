import type { Finding, HostArrayResult, Report, Severity } from '@/shared/analysis/types';
import { compareAccess, type PairImpact } from '@/lib/report/whatif';
import { storageHosts } from '@/shared/analysis/summary';
import type { Topology } from '@/shared/topology/schema';

/**
 * The report's host rows: one per host and array the baseline reaches. With a simulation each row
 * also carries the what-if result (null when the host is cut off) and its effect.
 */
export type HostRow = { host: string; array: string; before: HostArrayResult; after: HostArrayResult | null; effect: PairImpact['effect'] | null };

function weight(row: HostRow): number {
  if (row.effect === 'lost') return 0;
  if (!row.after?.redundant) return 1;
  return row.effect === 'reduced' ? 2 : 3;
}

/** Worst first: cut off, then not redundant, then reduced by the simulation; report order within each. */
export function hostRows(baseline: Report, simulated: Report | null): HostRow[] {
  const rows: HostRow[] = simulated
    ? compareAccess(baseline, simulated)
    : baseline.hosts.map((before) => ({ host: before.host, array: before.array, before, after: before, effect: null }));
  return rows.map((row, i) => ({ row, i })).sort((x, y) => weight(x.row) - weight(y.row) || x.i - y.i).map(({ row }) => row);
}

/**
 * Hosts with a data port that reach no array at all. `hosts[]` only lists pairs with sessions, so
 * without this a host cabled to nothing would simply be missing from the report's host list.
 */
export function hostsWithoutAccess(doc: Topology, report: Report): string[] {
  const reached = new Set(report.hosts.map((pair) => pair.host));
  return storageHosts(doc)
    .map((d) => d.id)
    .filter((id) => !reached.has(id))
    .sort();
}

export const SEVERITY_ORDER: readonly Severity[] = ['error', 'warning', 'info'];

export const SEVERITY_TITLES: Record<Severity, string> = { error: 'Errors', warning: 'Warnings', info: 'Notes' };

/** How many findings there are of each severity. */
export function severityCounts(findings: readonly Finding[]): Record<Severity, number> {
  const counts = { error: 0, warning: 0, info: 0 };
  for (const f of findings) counts[f.severity] += 1;
  return counts;
}

export function findingsBySeverity(findings: readonly Finding[]): { severity: Severity; findings: Finding[] }[] {
  return SEVERITY_ORDER.map((severity) => ({ severity, findings: findings.filter((f) => f.severity === severity) }));
}
