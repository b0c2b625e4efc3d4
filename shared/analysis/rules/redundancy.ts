import { byId, describeUnit, nameOf, unitKindOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding, HostArrayResult } from '@/shared/analysis/types';

/**
 * Findings about redundancy, read from hosts[]: single points of failure, hosts that reach no
 * array, and hosts that reach only one controller of an array that has more.
 */
const LISTED_UNITS = 4;

// Messages name the biggest units first: a switch explains more than the cable that leads to it.
const KIND_ORDER: Record<string, number> = { feed: 0, switch: 1, controller: 2, psu: 3, adapter: 4, cable: 5 };

function unitList(ctx: AnalysisContext, ids: string[]): string {
  const rank = (id: string) => KIND_ORDER[unitKindOf(ctx, id) ?? 'cable'];
  const units = [...ids].sort((x, y) => rank(x) - rank(y) || byId(x, y));
  const words = units.slice(0, LISTED_UNITS).map((unit) => describeUnit(ctx, unit));
  if (units.length > LISTED_UNITS) return `${words.join(', ')} and ${units.length - LISTED_UNITS} more`;
  if (words.length === 1) return words[0];
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

function hasDataPorts(ctx: AnalysisContext, hostId: string): boolean {
  const host = ctx.index.devices.get(hostId);
  return host?.kind === 'host' && host.adapters.some((a) => a.ports.some((p) => p.role === 'data'));
}

export function redundancyFindings(ctx: AnalysisContext, hosts: HostArrayResult[]): Finding[] {
  const findings: Finding[] = [];
  const reaching = new Set(hosts.map((pair) => pair.host));
  for (const pair of hosts) {
    if (pair.redundant && pair.controllersReached.length !== 1) continue;
    const host = nameOf(ctx, pair.host);
    const array = nameOf(ctx, pair.array);
    if (!pair.redundant) {
      findings.push({
        rule: 'single-point-of-failure',
        severity: 'error',
        subjects: [pair.host, pair.array, ...pair.singlePointsOfFailure],
        message: `${host} reaches ${array} only through ${unitList(ctx, pair.singlePointsOfFailure)}; losing ${pair.singlePointsOfFailure.length === 1 ? 'it' : 'any one of them'} cuts ${host} off from ${array}.`,
      });
    }
    const device = ctx.index.devices.get(pair.array);
    const controllerCount = device?.kind === 'array' ? device.controllers.length : 0;
    if (pair.controllersReached.length === 1 && controllerCount > 1) {
      const controller = pair.controllersReached[0];
      findings.push({
        rule: 'one-controller-only',
        severity: 'error',
        subjects: [pair.host, pair.array, controller],
        message: `${host} reaches only ${describeUnit(ctx, controller)}; when that controller fails or restarts for an update, ${host} loses ${array}.`,
      });
    }
  }
  for (const device of ctx.doc.devices) {
    if (device.kind !== 'host' || reaching.has(device.id) || !hasDataPorts(ctx, device.id)) continue;
    findings.push({
      rule: 'host-unreachable',
      severity: 'error',
      subjects: [device.id],
      message: `${nameOf(ctx, device.id)} has data ports but reaches no storage array.`,
    });
  }
  return findings;
}
