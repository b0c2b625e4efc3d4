import type { Report } from '@/shared/analysis/types';
import { bringUpSteps, type Step } from '@/shared/build';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';

/**
 * What the build record needs of a version, kept per version row: its document (read, validated
 * and upgraded to format 2) and its plan — the bring-up checklist and the cable and step ids.
 * A version never changes, so neither do these; a phone marking cable after cable then reads and
 * validates the document once, and the checklist is built once, while the version stays among
 * the recently used. The planned session counts come from the version's stored report
 * (`loadHosts`), so no analysis runs on the request thread.
 */
export type VersionPlan = { steps: Step[]; stepIds: ReadonlySet<string>; cableIds: ReadonlySet<string> };

const KEPT = 32;

type Entry = { doc: Topology; plan: VersionPlan | null };

/** The `hosts[]` of a version row's report: the stored one, or one computed in the analysis pool. */
export type LoadHosts = (versionId: number) => Promise<Report['hosts']>;

export function createVersionCache(loadHosts: LoadHosts) {
  const entries = new Map<number, Entry>();

  function touch(versionId: number): Entry | undefined {
    const known = entries.get(versionId);
    if (known) {
      // A Map keeps insertion order: move the entry to the newest end.
      entries.delete(versionId);
      entries.set(versionId, known);
    }
    return known;
  }

  return {
    /** The stored document of a version row; `load` reads its JSON when it is not kept. */
    async document(versionId: number, load: () => Promise<unknown>): Promise<Topology> {
      const known = touch(versionId);
      if (known) return known.doc;
      const checked = validateTopology(await load());
      if (!checked.ok) throw new Error(`stored version ${versionId} no longer validates: ${checked.issues[0]?.message}`);
      entries.set(versionId, { doc: checked.doc, plan: null });
      if (entries.size > KEPT) entries.delete(entries.keys().next().value as number);
      return checked.doc;
    },

    /** The version's checklist and ids (document() first). */
    async plan(versionId: number, doc: Topology): Promise<VersionPlan> {
      const entry = touch(versionId);
      if (entry?.plan) return entry.plan;
      const steps = bringUpSteps(doc, { hosts: await loadHosts(versionId) });
      const plan: VersionPlan = { steps, stepIds: new Set(steps.map((s) => s.id)), cableIds: new Set(doc.cables.map((c) => c.id)) };
      if (entry) entry.plan = plan;
      return plan;
    },
  };
}

export type VersionCache = ReturnType<typeof createVersionCache>;
