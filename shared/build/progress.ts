import { CABLE_STATES, DONE_STATE, type BuildProgress, type CableState, type Count, type RackProgress } from '@/shared/api/build';
import { displayName, indexTopology } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';
import { byName } from './step-kit';
import type { Step } from './types';

/**
 * Progress of a build record: cables done (tested) of all cables, steps done of all steps, cables
 * per state, and the same per rack. A cable counts in every rack one of its ends is placed in (a
 * cable between racks A01 and A02 is work in both); a step counts in the rack it names. What is
 * not placed (cables with an unplaced end, device steps of unplaced devices) is the `rackId: null`
 * entry, present only when it holds something. Safety and other steps about no device count in
 * the totals only.
 */
export function buildProgress(doc: Topology, steps: readonly Step[], cableState: (cableId: string) => CableState, stepDone: (stepId: string) => boolean): BuildProgress {
  const index = indexTopology(doc);
  const racks = new Map((doc.racks ?? []).map((r) => [r.id, r]));
  const tally = new Map<string | null, { cables: Count; steps: Count }>();
  const counter = (rackId: string | null) => {
    let entry = tally.get(rackId);
    if (!entry) tally.set(rackId, (entry = { cables: { done: 0, total: 0 }, steps: { done: 0, total: 0 } }));
    return entry;
  };

  const states = Object.fromEntries(CABLE_STATES.map((s) => [s, 0])) as Record<CableState, number>;
  const cables: Count = { done: 0, total: 0 };
  for (const cable of doc.cables) {
    const state = cableState(cable.id);
    const done = state === DONE_STATE ? 1 : 0;
    states[state] += 1;
    cables.total += 1;
    cables.done += done;
    const where = new Set<string | null>();
    for (const end of [cable.a, cable.b]) {
      const rackId = index.ports.get(end)?.device.placement?.rackId;
      where.add(rackId !== undefined && racks.has(rackId) ? rackId : null);
    }
    for (const rackId of where) {
      const entry = counter(rackId).cables;
      entry.total += 1;
      entry.done += done;
    }
  }

  const stepCount: Count = { done: 0, total: 0 };
  for (const step of steps) {
    const done = stepDone(step.id) ? 1 : 0;
    stepCount.total += 1;
    stepCount.done += done;
    if (step.rackId === null && step.deviceId === null) continue;
    const entry = counter(step.rackId).steps;
    entry.total += 1;
    entry.done += done;
  }

  const perRack: RackProgress[] = byName([...racks.values()]).map((rack) => ({ rackId: rack.id, rack: displayName(rack), ...(tally.get(rack.id) ?? counter(rack.id)) }));
  const loose = tally.get(null);
  if (loose) perRack.push({ rackId: null, rack: null, ...loose });
  return { cables, steps: stepCount, states, racks: perRack };
}
