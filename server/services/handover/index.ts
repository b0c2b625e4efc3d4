import type { User } from '@/shared/api/auth';
import type { Report } from '@/shared/analysis/types';
import type { HandoverApproval, HandoverMeta } from '@/shared/handover/pack';
import { exportFileName } from '@/shared/schedule/tables';
import { validateTopology } from '@/shared/topology/validate';
import type { DesignDeps } from '@/server/services/designs/deps';
import { findVersion, loadDesignView, loadDocumentText, type VersionRecord } from '@/server/services/designs/load';
import { NO_SUCH_DESIGN, noSuchVersion } from '@/server/services/designs/messages';
import type { UserRow } from '@/server/models';
import { fail, ok, type Result } from '@/server/services/result';
import type { Download } from '@/server/services/build-sheet';
import { buildHandoverPdf, HandoverTooSlowError } from './pool';

/**
 * The handover pack of a version (api.md `GET …/handover.pdf`): read as the version itself is
 * (installers approved versions only, another team 404). The report is the one stored with the
 * version (or, for a version saved before reports were stored, one made in the analysis pool); the
 * PDF is written on a worker thread. Secrets never reach it: the pack reads the CHAP mode only.
 */
export const PDF_TYPE = 'application/pdf';

/** The version's newest approval, if its state is approved (a later request for changes ends it). */
export function approvalOf(record: VersionRecord, people: ReadonlyMap<number, UserRow>): HandoverApproval | null {
  if (record.state !== 'approved') return null;
  let newest: VersionRecord['events'][number] | undefined;
  for (const e of record.events) if (e.action === 'approve' && (!newest || e.id > newest.id)) newest = e;
  if (!newest) return null;
  return { by: people.get(newest.actorId)?.name ?? 'a former member', at: newest.createdAt.toISOString(), comment: newest.comment, override: newest.override };
}

export function createHandoverService(deps: Pick<DesignDeps, 'models' | 'analysis'>) {
  const { models, analysis } = deps;

  async function storedReport(versionId: number, documentJson: string): Promise<Report> {
    const row = await models.DesignVersion.findByPk(versionId, { attributes: ['id', 'report'] });
    if (row?.report) return JSON.parse(row.report) as Report;
    const computed = await analysis.report(documentJson);
    if (!computed.ok) throw new Error(`the report of stored version ${versionId} could not be made: ${computed.message}`);
    return JSON.parse(computed.value.reportJson) as Report;
  }

  return {
    async handoverPdf(viewer: User, id: number, n: number): Promise<Result<Download>> {
      const view = await loadDesignView(models, viewer, id);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      const record = findVersion(view, n);
      if (!record) return fail('not-found', noSuchVersion(n));
      const text = await loadDocumentText(models, record.row.id);
      const checked = validateTopology(JSON.parse(text) as unknown);
      if (!checked.ok) throw new Error(`stored version ${record.row.id} no longer validates: ${checked.issues[0]?.message}`);
      const meta: HandoverMeta = {
        design: view.design.name,
        site: view.design.site,
        version: n,
        message: record.row.message,
        author: view.people.get(record.row.authorId)?.name ?? 'a former member',
        savedAt: record.row.createdAt.toISOString(),
        approval: approvalOf(record, view.people),
      };
      try {
        const body = await buildHandoverPdf({ doc: checked.doc, report: await storedReport(record.row.id, text), meta });
        return ok({ fileName: exportFileName(view.design.name, n, 'handover', 'pdf'), contentType: PDF_TYPE, body });
      } catch (error) {
        if (!(error instanceof HandoverTooSlowError)) throw error;
        return fail('unavailable', 'The handover pack took too long to write; try again in a minute.');
      }
    },
  };
}

export type HandoverService = ReturnType<typeof createHandoverService>;
