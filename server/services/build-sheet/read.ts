import type { User } from '@/shared/api/auth';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import type { Models } from '@/server/models';
import { findVersion, loadDesignView, loadDocument } from '@/server/services/designs/load';
import { NO_SUCH_DESIGN, noSuchVersion } from '@/server/services/designs/messages';
import { fail, ok, type Result } from '@/server/services/result';

/**
 * A version's document for the build sheet, read as the role table allows (docs/api.md): another team's
 * design, and for an installer a version that is not approved, are 404 like one that does not exist.
 * Stored documents of any format come back as format 2; the stored text is not touched.
 */
export type OpenedDocument = { doc: Topology; designName: string; number: number };

export async function openVersionDocument(models: Models, viewer: User, id: number, n: number): Promise<Result<OpenedDocument>> {
  const view = await loadDesignView(models, viewer, id);
  if (!view) return fail('not-found', NO_SUCH_DESIGN);
  const record = findVersion(view, n);
  if (!record) return fail('not-found', noSuchVersion(n));
  const checked = validateTopology(await loadDocument(models, record.row.id));
  if (!checked.ok) throw new Error(`stored version ${record.row.id} no longer validates: ${checked.issues[0]?.message}`);
  return ok({ doc: checked.doc, designName: view.design.name, number: n });
}
