import { createContext, unitKindOf } from '@/shared/analysis/context';
import type { Issue } from '@/shared/api/common';
import type { TopologyIndex } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';

/**
 * The `--failed` ids that are not failure units of the document, each with a sentence saying what
 * the id is instead: an id that names nothing, or a port, host, array or network, would otherwise
 * be ignored by the what-if run and read as "no impact". The failure units are the analysis's own
 * (unitKindOf), so the two can never disagree.
 */
function whatItIs(index: TopologyIndex, id: string): string {
  const device = index.devices.get(id);
  if (device?.kind === 'host') return 'a host, which is not a failure unit; fail one of its cards or cables instead';
  if (device?.kind === 'array') return 'an array, which is not a failure unit; fail one of its controllers instead';
  if (index.ports.has(id)) return 'a port, which is not a failure unit; fail its card, controller or switch, or its cable, instead';
  if (index.networks.has(id)) return 'a network, which is not a failure unit';
  return 'not an id in this document';
}

export function failedIdIssues(doc: Topology, failed: readonly string[]): Issue[] {
  if (failed.length === 0) return [];
  const ctx = createContext(doc);
  const issues: Issue[] = [];
  for (const id of failed) {
    if (unitKindOf(ctx, id) !== null) continue;
    issues.push({ path: '--failed', message: `${JSON.stringify(id)} is ${whatItIs(ctx.index, id)}.` });
  }
  return issues;
}
