import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { RestoreBody, SaveVersionBody, VersionDetail, VersionSummary } from '@/shared/api/designs';
import { diffTopologies, type TopologyDiff } from '@/shared/diff';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import type { Models } from '@/server/models';
import { fail, ok, type Failure, type Result } from '@/server/services/result';
import { writeTransaction, type DesignDeps, type Within } from './deps';
import { toVersionDetail, toVersionSummary } from './dto';
import type { StoredReport } from '@/server/services/analysis';
import { loadLabelHistory } from './labels';
import { findVersion, loadDesignView, loadDocument, loadDocumentText, type DesignView, type VersionRecord } from './load';
import { NO_SUCH_DESIGN, noSuchVersion } from './messages';
import { appendVersion, latestNumber, type PreparedDocument } from './write';

/** A version the viewer may open, with its design; or the 404 that hides it. */
async function openVersion(models: Models, viewer: User, id: number, n: number): Promise<Result<{ view: DesignView; record: VersionRecord }>> {
  const view = await loadDesignView(models, viewer, id);
  if (!view) return fail('not-found', NO_SUCH_DESIGN);
  const record = findVersion(view, n);
  if (!record) return fail('not-found', noSuchVersion(n));
  return ok({ view, record });
}

/** A stored document, typed. It passed validation when it was saved; failing now is a bug, not the caller's mistake. */
async function storedTopology(models: Models, record: VersionRecord): Promise<Topology> {
  const checked = validateTopology(await loadDocument(models, record.row.id));
  if (!checked.ok) throw new Error(`stored version ${record.row.id} no longer validates: ${checked.issues[0]?.message}`);
  return checked.doc;
}

function conflict(latest: number | null): Failure {
  const message =
    latest === null
      ? 'This design has no versions yet; save with baseVersion null.'
      : `Version ${latest} was saved since you opened this design. Open version ${latest}, apply your changes there and save again.`;
  return fail('conflict', message, { details: { latestVersion: latest } });
}

/** Versions of a design: read one, its report and a diff; save a new one; restore an old one as a new one. */
export function createVersionService(deps: DesignDeps) {
  const { models, now, analysis } = deps;

  /** Write the next version and answer it; a lost race on the unique index is a conflict, not an error. */
  async function write(
    viewer: User,
    id: number,
    input: { message: string; prepared: PreparedDocument; baseVersion?: number | null },
    within: Within,
  ): Promise<Result<VersionSummary>> {
    let number: number;
    try {
      const outcome = await writeTransaction(deps, within, async (transaction: Transaction) => {
        const design = await models.Design.findOne({ where: { id, teamId: viewer.teamId }, transaction });
        if (!design) return fail('not-found', NO_SUCH_DESIGN);
        if (input.baseVersion !== undefined) {
          const latest = await latestNumber(models, id, transaction);
          if (input.baseVersion !== latest) return conflict(latest);
        }
        const row = await appendVersion(models, transaction, { designId: id, authorId: viewer.id, message: input.message, prepared: input.prepared, at: now() });
        return ok(row.number);
      });
      if (!outcome.ok) return outcome;
      number = outcome.value;
    } catch (error) {
      // The IMMEDIATE transaction already serialises writers; the unique (design, number) index is the last guard.
      if (!(error instanceof UniqueConstraintError)) throw error;
      return conflict(await latestNumber(models, id));
    }
    const view = await loadDesignView(models, viewer, id, within.transaction);
    const record = view && findVersion(view, number);
    if (!view || !record) throw new Error(`version ${number} of design ${id} not readable right after saving`);
    return ok(toVersionSummary(record, view.people));
  }

  return {
    async get(viewer: User, id: number, n: number): Promise<Result<VersionDetail>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const { view, record } = opened.value;
      return ok(toVersionDetail(record, view.people, await storedTopology(models, record)));
    },

    /**
     * The full analysis as JSON text: the report stored with the version when it was saved. A version
     * saved before reports were stored has none; its document is analysed again in the analysis pool
     * on each request, and nothing is written back (versions never change).
     */
    async report(viewer: User, id: number, n: number): Promise<Result<StoredReport>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const { row } = opened.value.record;
      const stored = await models.DesignVersion.findByPk(row.id, { attributes: ['id', 'report'] });
      if (stored?.report) return ok({ summary: JSON.parse(row.summary) as StoredReport['summary'], reportJson: stored.report });
      const computed = await analysis.report(await loadDocumentText(models, row.id));
      if (!computed.ok && computed.kind === 'invalid') throw new Error(`stored version ${row.id} no longer validates: ${computed.message}`);
      return computed;
    },

    /**
     * afterOneFailure as JSON text: stored with the version when it was saved; for a version stored
     * without it (saved before, or past the save's budget) computed in the analysis pool on each request.
     */
    async afterOne(viewer: User, id: number, n: number): Promise<Result<{ afterOneJson: string }>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const { row } = opened.value.record;
      const stored = await models.DesignVersion.findByPk(row.id, { attributes: ['id', 'afterOne'] });
      if (stored?.afterOne) return ok({ afterOneJson: stored.afterOne });
      const computed = await analysis.afterOne(await loadDocumentText(models, row.id));
      if (!computed.ok && computed.kind === 'invalid') throw new Error(`stored version ${row.id} no longer validates: ${computed.message}`);
      return computed;
    },

    /** What changed going from version `against` to version `n`: `against` is the before side, `n` the after side. */
    async diff(viewer: User, id: number, n: number, against: number): Promise<Result<TopologyDiff>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const before = findVersion(opened.value.view, against);
      if (!before) return fail('not-found', noSuchVersion(against));
      return ok(diffTopologies(await storedTopology(models, before), await storedTopology(models, opened.value.record)));
    },

    /** Save a new version on top of `baseVersion`, which must still be the latest (null when there is none). */
    async save(viewer: User, id: number, body: SaveVersionBody, within: Within = {}): Promise<Result<VersionSummary>> {
      // Editors see every design of their team, so one indexed lookup answers "is it theirs?".
      const own = await models.Design.findOne({ where: { id, teamId: viewer.teamId }, attributes: ['id'], transaction: within.transaction });
      if (!own) return fail('not-found', NO_SUCH_DESIGN);
      const prepared = await analysis.prepare(body.document, await loadLabelHistory(models, id, within.transaction));
      if (!prepared.ok) return prepared;
      return write(viewer, id, { message: body.message, prepared: prepared.value, baseVersion: body.baseVersion }, within);
    },

    /**
     * Make version `n`'s document the newest version again, on top of whatever is latest now (no base
     * check: restoring does not build on what the client had open). The analysis is run afresh, in the
     * analysis pool, so the new version's report is today's analysis of that document.
     */
    async restore(viewer: User, id: number, n: number, body: RestoreBody): Promise<Result<VersionSummary>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const prepared = await analysis.prepareJson(await loadDocumentText(models, opened.value.record.row.id), await loadLabelHistory(models, id));
      if (!prepared.ok && prepared.kind === 'invalid') throw new Error(`stored version ${n} of design ${id} no longer validates`);
      if (!prepared.ok) return prepared;
      return write(viewer, id, { message: body.message, prepared: prepared.value }, {});
    },
  };
}

export type VersionService = ReturnType<typeof createVersionService>;
