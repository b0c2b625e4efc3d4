import { analyze } from '@/shared/analysis/analyze';
import { bringUpSteps, type Step } from '@/shared/build';
import type { Topology } from '@/shared/topology/schema';

/**
 * The bring-up checklist and cable ids of a version, kept per version row: a version never changes,
 * so neither does its checklist, and the analysis it needs (the planned session counts) runs once
 * per version while it stays among the recently used ones. The analysis runs on the request thread,
 * as the report route's does (under 0.5 s for 5,000 hosts, npm run bench).
 */
export type VersionPlan = { steps: Step[]; stepIds: ReadonlySet<string>; cableIds: ReadonlySet<string> };

const KEPT = 32;

export function createPlanCache() {
  const plans = new Map<number, VersionPlan>();
  return (versionId: number, doc: Topology): VersionPlan => {
    const known = plans.get(versionId);
    if (known) {
      // Map keeps insertion order: move it to the newest end.
      plans.delete(versionId);
      plans.set(versionId, known);
      return known;
    }
    const steps = bringUpSteps(doc, analyze(doc));
    const plan: VersionPlan = { steps, stepIds: new Set(steps.map((s) => s.id)), cableIds: new Set(doc.cables.map((c) => c.id)) };
    plans.set(versionId, plan);
    if (plans.size > KEPT) plans.delete(plans.keys().next().value as number);
    return plan;
  };
}

export type PlanCache = ReturnType<typeof createPlanCache>;
