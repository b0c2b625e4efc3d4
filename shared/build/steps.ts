import type { HostArrayResult, Report } from '@/shared/analysis/types';
import { indexTopology } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';
import { deviceSteps, managementSteps } from './device-steps';
import { hostSteps } from './host-steps';
import { rackSteps } from './rack-steps';
import { safetySteps } from './safety';
import type { Step, StepContext } from './types';

export { STEP_PHASES, type Step, type StepKind, type StepPhase } from './types';

/**
 * The bring-up checklist of one version: what the installer does, in order, once the cables are
 * in. Pure and deterministic: the same document and report give the same steps with the same ids.
 *
 * Order (phases):
 *  1. safety — the briefing: heavy equipment and two-person lifts, rack stability, power circuits
 *     within their ratings, laser light (IEC 60825-1 Class 1), live data; local codes first.
 *  2. racks — per rack (natural order of names, then what is not placed): stand and stabilise it,
 *     mount its equipment from the bottom up; then connect its power, everything still off.
 *  3. switches — power on every switch first, management switches before data and shared ones,
 *     then by name; each with the VLANs and MTUs of the networks on its ports.
 *  4. shelves — per array, its expansion shelves if it has any (the design does not draw them).
 *  5. arrays — power on each array and wait for its ready indication; check its data ports.
 *  6. hosts — per host (by name): initiator name set; each data port's address, VLAN and MTU;
 *     CHAP when the design asks for it; target portals discovered (TCP 3260); sessions logged in,
 *     as many as the analysis plans (`expectedSessions`: report.hosts[].sessions summed over the
 *     host's arrays); multipath checked across the controllers reached.
 *  7. management — every device's management ports reachable.
 * The power-on order switches → shelves → array → hosts once the array is ready is common practice.
 *
 * Step ids are `tupleKey([kind, ...document ids])` — e.g. `["login","wms-db-1"]` — so they depend
 * on ids only: a mark keeps its step across reloads and renames, and no two steps share an id
 * whatever characters the ids hold.
 */
export function bringUpSteps(doc: Topology, report: Pick<Report, 'hosts'>): Step[] {
  const planned = new Map<string, HostArrayResult[]>();
  for (const result of report.hosts) {
    const list = planned.get(result.host);
    if (list) list.push(result);
    else planned.set(result.host, [result]);
  }
  const ctx: StepContext = { doc, index: indexTopology(doc), racks: new Map((doc.racks ?? []).map((r) => [r.id, r])), planned };
  return [...safetySteps(), ...rackSteps(ctx), ...deviceSteps(ctx), ...hostSteps(ctx), ...managementSteps(ctx)];
}

/** The sessions the analysis plans for one host: its pairs' session counts summed. */
export function plannedSessions(report: Pick<Report, 'hosts'>, hostId: string): number {
  return report.hosts.reduce((sum, r) => (r.host === hostId ? sum + r.sessions : sum), 0);
}
