import type { Report } from '@/shared/analysis/types';
import type { HostDevice, Topology } from '@/shared/topology/schema';

/**
 * The few numbers the server stores with each version and the design list shows.
 *
 * - `errors`, `warnings`: how many findings have that severity (info findings are not counted).
 * - `singlePointsOfFailure`: how many distinct failure units appear in `failures[]`, i.e. units whose
 *   loss alone cuts at least one host off at least one array. A switch that cuts off six hosts counts once.
 * - `hosts`: how many hosts have at least one data port (hosts with only management ports are not
 *   storage clients and are left out).
 * - `redundantHosts`: how many of those hosts reach at least one array and have no single point of
 *   failure towards any array they reach (every (host, array) pair of theirs is redundant).
 */
export type ReportSummary = {
  errors: number;
  warnings: number;
  singlePointsOfFailure: number;
  hosts: number;
  redundantHosts: number;
};

/** Hosts with at least one data port: the storage clients the summary and the report count. */
export function storageHosts(doc: Topology): HostDevice[] {
  return doc.devices.filter((d): d is HostDevice => d.kind === 'host' && d.adapters.some((a) => a.ports.some((p) => p.role === 'data')));
}

export function summarize(report: Report, doc: Topology): ReportSummary {
  const hosts = storageHosts(doc);
  const pairsOf = new Map<string, boolean>();
  for (const pair of report.hosts) pairsOf.set(pair.host, (pairsOf.get(pair.host) ?? true) && pair.redundant);
  return {
    errors: report.findings.filter((f) => f.severity === 'error').length,
    warnings: report.findings.filter((f) => f.severity === 'warning').length,
    singlePointsOfFailure: new Set(report.failures.map((f) => f.unit)).size,
    hosts: hosts.length,
    redundantHosts: hosts.filter((h) => pairsOf.get(h.id) === true).length,
  };
}
