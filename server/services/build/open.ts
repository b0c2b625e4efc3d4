import type { User } from '@/shared/api/auth';
import type { BuildRecord } from '@/shared/api/build';
import type { Topology } from '@/shared/topology/schema';
import type { Models } from '@/server/models';
import { approvedVersionOf } from '@/server/services/designs/dto';
import { findVersion, loadDesignView, loadDocument, type DesignView, type VersionRecord } from '@/server/services/designs/load';
import { NO_SUCH_DESIGN, noSuchVersion } from '@/server/services/designs/messages';
import { STATE_WORDS } from '@/server/services/designs/review-state';
import { fail, ok, type Result } from '@/server/services/result';
import type { VersionCache } from './version-cache';

type OpenDeps = { models: Models; versions: VersionCache };

/** A version as the build record sees it: the design view, the version's record and its stored document. */
export type OpenedBuild = { view: DesignView; record: VersionRecord; doc: Topology };

/**
 * The version `n` of design `id` as the viewer may read it (docs/api.md's role table): another team's
 * design, and for an installer a version that is not approved, answer 404 like one that does not exist.
 */
export async function openBuild({ models, versions }: OpenDeps, viewer: User, id: number, n: number): Promise<Result<OpenedBuild>> {
  const view = await loadDesignView(models, viewer, id);
  if (!view) return fail('not-found', NO_SUCH_DESIGN);
  const record = findVersion(view, n);
  if (!record) return fail('not-found', noSuchVersion(n));
  const doc = await versions.document(record.row.id, () => loadDocument(models, record.row.id));
  return ok({ view, record, doc });
}

/**
 * The same, for writing to the record: only an approved version takes marks and photos. Installers
 * never see other versions (404 above); an admin marking a version that is not approved is told
 * why with 409, the status docs/api.md gives an action in the wrong review state.
 */
export async function openForMarking(deps: OpenDeps, viewer: User, id: number, n: number): Promise<Result<OpenedBuild>> {
  const opened = await openBuild(deps, viewer, id, n);
  if (!opened.ok) return opened;
  const { state } = opened.value.record;
  if (state !== 'approved') {
    return fail('conflict', `Version ${n} is ${STATE_WORDS[state]}; only an approved version is built, so only its record takes marks and photos.`);
  }
  return opened;
}

/** The newest approved version numbered above `n`, or null: a newer approval supersedes this record. */
export function supersededBy(view: DesignView, n: number): BuildRecord['supersededBy'] {
  const newer = { ...view, versions: view.all.filter((v) => v.row.number > n) };
  return approvedVersionOf(newer);
}
