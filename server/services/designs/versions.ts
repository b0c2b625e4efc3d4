import { createHash } from 'node:crypto';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { RestoreBody, SaveVersionBody, VersionSummary } from '@/shared/api/designs';
import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import type { Models } from '@/server/models';
import { fail, ok, type Failure, type Result } from '@/server/services/result';
import { writeTransaction, type DesignDeps, type Within } from './deps';
import { toDesignDto, toVersionSummary } from './dto';
import type { StoredReport } from '@/server/services/analysis';
import { loadLabelHistory } from './labels';
import { findVersion, loadDesignView, loadDocumentText, type DesignView, type VersionRecord } from './load';
import { NO_SUCH_DESIGN, noSuchVersion } from './messages';
import { appendVersion, latestNumber, type PreparedDocument } from './write';

export type OpenedVersion = { view: DesignView; record: VersionRecord };

/**
 * Bump when what a version's answers are made of changes for the same stored row (the format 1
 * upgrade, the shape of the answer): every entity tag changes with it, so no browser keeps an old one.
 */
const ANSWER_EPOCH = '1';

/** A strong entity tag (RFC 9110 §8.8.3): the version row, and a hash of the parts of the answer that can change. */
function entityTag(kind: string, record: VersionRecord, changing: string): string {
  const hash = createHash('sha256').update(ANSWER_EPOCH).update('\0').update(record.row.contentHash).update('\0').update(changing).digest('base64url');
  return `"${kind}${record.row.id}-${hash.slice(0, 22)}"`;
}

/** Text of a JSON object with one more field, whose value is already JSON text. */
function withField(objectJson: string, key: string, valueJson: string): string {
  return `${objectJson.slice(0, -1)}${objectJson.length > 2 ? ',' : ''}${JSON.stringify(key)}:${valueJson}}`;
}

/** A stored document in format 2 begins with its format (validateTopology writes `format` first). */
function isCurrentFormat(text: string): boolean {
  return text.startsWith(`{"format":${JSON.stringify(TOPOLOGY_FORMAT)},`);
}

/** A version the viewer may open, with its design; or the 404 that hides it. */
async function openVersion(models: Models, viewer: User, id: number, n: number): Promise<Result<OpenedVersion>> {
  const view = await loadDesignView(models, viewer, id);
  if (!view) return fail('not-found', NO_SUCH_DESIGN);
  const record = findVersion(view, n);
  if (!record) return fail('not-found', noSuchVersion(n));
  return ok({ view, record });
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

  /** The version's document as format 2 JSON text, read without parsing it on the request thread. */
  async function documentText(record: VersionRecord): Promise<Result<string>> {
    const text = await loadDocumentText(models, record.row.id);
    // Saved as format 2, it was validated and cleaned when it was saved: it is served as stored.
    if (isCurrentFormat(text)) return ok(text);
    const upgraded = await analysis.storedDocument(text);
    if (!upgraded.ok && upgraded.kind === 'invalid') throw new Error(`stored version ${record.row.id} no longer validates: ${upgraded.message}`);
    return upgraded;
  }

  /** The stored report, or null for a version saved before reports were stored with versions. */
  async function storedReport(record: VersionRecord): Promise<StoredReport | null> {
    const stored = await models.DesignVersion.findByPk(record.row.id, { attributes: ['id', 'report'] });
    return stored?.report ? { summary: JSON.parse(record.row.summary) as StoredReport['summary'], reportJson: stored.report } : null;
  }

  async function reportOf(record: VersionRecord): Promise<Result<StoredReport>> {
    const stored = await storedReport(record);
    if (stored) return ok(stored);
    const computed = await analysis.report(await loadDocumentText(models, record.row.id));
    if (!computed.ok && computed.kind === 'invalid') throw new Error(`stored version ${record.row.id} no longer validates: ${computed.message}`);
    return computed;
  }

  async function hasStoredReport(record: VersionRecord): Promise<boolean> {
    return (await models.DesignVersion.count({ where: { id: record.row.id, report: { [Op.ne]: null } } })) > 0;
  }

  return {
    /** A version the viewer may open (404 otherwise), for the reads below. */
    open: (viewer: User, id: number, n: number) => openVersion(models, viewer, id, n),

    /**
     * The entity tag of a version's answer. The document never changes; the review thread and the
     * names shown do, so they are hashed in (they are small). A format 1 document is upgraded on each
     * read by code that may change, so ANSWER_EPOCH is part of every tag.
     */
    detailTag({ view, record }: OpenedVersion): string {
      return entityTag('v', record, JSON.stringify(toVersionSummary(record, view.people)));
    },

    /** `{version}` of GET …/versions/:n as JSON text: the stored document is never parsed on the request thread. */
    async detailJson({ view, record }: OpenedVersion): Promise<Result<string>> {
      const document = await documentText(record);
      if (!document.ok) return document;
      return ok(withField(JSON.stringify(toVersionSummary(record, view.people)), 'document', document.value));
    },

    /**
     * The tag of the report: a stored report never changes, so its tag is the version's. A version
     * saved before reports were stored is analysed afresh on each request and has no tag.
     */
    async reportTag({ record }: OpenedVersion): Promise<string | null> {
      return (await hasStoredReport(record)) ? entityTag('r', record, record.row.summary) : null;
    },

    /**
     * The full analysis as JSON text: the report stored with the version when it was saved. A version
     * saved before reports were stored has none; its document is analysed again in the analysis pool
     * on each request, and nothing is written back (versions never change).
     */
    report: ({ record }: OpenedVersion): Promise<Result<StoredReport>> => reportOf(record),

    /** The tag of the report screen's answer: null when the report is not stored. */
    async reportPageTag({ view, record }: OpenedVersion, viewer: User): Promise<string | null> {
      if (!(await hasStoredReport(record))) return null;
      return entityTag('p', record, JSON.stringify([toDesignDto(view, viewer), toVersionSummary(record, view.people)]));
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

    /**
     * Everything the report screen shows, in one answer: `{design, version, report, summary}` (the
     * design as GET /api/designs/:id gives it, the version with its document as GET …/versions/:n,
     * the report and summary as GET …/report), assembled from stored text.
     */
    async reportPage({ view, record }: OpenedVersion, viewer: User): Promise<Result<string>> {
      const [document, report] = await Promise.all([documentText(record), reportOf(record)]);
      if (!document.ok) return document;
      if (!report.ok) return report;
      const version = withField(JSON.stringify(toVersionSummary(record, view.people)), 'document', document.value);
      return ok(`{"design":${JSON.stringify(toDesignDto(view, viewer))},"version":${version},"report":${report.value.reportJson},"summary":${JSON.stringify(report.value.summary)}}`);
    },

    /** What changed going from version `against` to version `n` (JSON text): `against` is the before side, `n` the after side. */
    async diff(viewer: User, id: number, n: number, against: number): Promise<Result<string>> {
      const opened = await openVersion(models, viewer, id, n);
      if (!opened.ok) return opened;
      const before = findVersion(opened.value.view, against);
      if (!before) return fail('not-found', noSuchVersion(against));
      const [beforeText, afterText] = await Promise.all([loadDocumentText(models, before.row.id), loadDocumentText(models, opened.value.record.row.id)]);
      const diff = await analysis.diff(beforeText, afterText);
      if (!diff.ok && diff.kind === 'invalid') throw new Error(`a stored version of design ${id} no longer validates: ${diff.message}`);
      return diff;
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
     * The same from the request body as it came over the wire (JSON text): the body is parsed, its
     * fields checked and its document validated and analysed in one analysis task, so the request
     * thread never parses or walks a large document. A design the viewer cannot see is 404 before
     * anything is analysed.
     */
    async saveBody(viewer: User, id: number, bodyText: string): Promise<Result<VersionSummary>> {
      const own = await models.Design.findOne({ where: { id, teamId: viewer.teamId }, attributes: ['id'] });
      if (!own) return fail('not-found', NO_SUCH_DESIGN);
      const prepared = await analysis.prepareSave(bodyText, await loadLabelHistory(models, id));
      if (!prepared.ok) return prepared;
      const { fields } = prepared.value;
      return write(viewer, id, { message: fields.message, prepared: prepared.value.prepared, baseVersion: fields.baseVersion }, {});
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
