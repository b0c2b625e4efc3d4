import type { User } from '@/shared/api/auth';
import type { ReviewBody, ReviewResponse } from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';
import { can, ROLE_LABELS } from '@/shared/roles';
import type { ReviewEventRow } from '@/server/models';
import { fail, invalid, ok, type Failure, type Result } from '@/server/services/result';
import { writeTransaction, type DesignDeps, type Within } from './deps';
import { toDesignDto, toReview } from './dto';
import { findVersion, loadDesignView, type VersionRecord } from './load';
import { NO_SUCH_DESIGN, noSuchVersion } from './messages';
import { createReviewNotifier } from './notifications';
import { designStatus, STATE_WORDS, versionState } from './review-state';
import { latestNumber } from './write';

const ACTION_WORDS = { submit: 'submit versions for review', approve: 'approve versions', 'request-changes': 'ask for changes' };

/**
 * The review of a version: submit (designer/admin), then approve or request changes (reviewer/admin).
 *
 * - Only the latest version can be submitted, and only while it is a draft: an older draft has been
 *   superseded by the newer one, which is what should be reviewed. A version sent back stays sent
 *   back; the fix is a new version, submitted in its turn.
 * - Approve and request-changes need a version in review, and never by the version's author, nor by
 *   anyone who saved a version of the design with the same content (same content hash): restoring
 *   someone's version makes a new one authored by the restorer, and its content stays theirs.
 * - Asking for changes needs a comment; approving a version whose stored summary has errors needs a
 *   comment that explains the override, and the event is marked `override`.
 * - The design's status is recomputed from all its versions in the same transaction.
 * Checks run in this order: role (403), design and version (404), own version (403), state (409),
 * comment (400) — what cannot be fixed by adding a comment is said first.
 */
export function createReviewService(deps: DesignDeps) {
  const { models, now } = deps;
  const notifier = createReviewNotifier(deps);

  return {
    async act(viewer: User, id: number, n: number, body: ReviewBody, within: Within = {}): Promise<Result<ReviewResponse>> {
      const capability = body.action === 'submit' ? 'editDesigns' : 'review';
      if (!can(viewer.role, capability)) {
        return fail('forbidden', `Your role (${ROLE_LABELS[viewer.role]}) does not allow you to ${ACTION_WORDS[body.action]}.`);
      }
      const view = await loadDesignView(models, viewer, id, within.transaction);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      const record = findVersion(view, n);
      if (!record) return fail('not-found', noSuchVersion(n));
      if (body.action !== 'submit') {
        const ownWork = ownContent(view.all, record, viewer.id);
        if (ownWork) return ownWork;
      }
      const comment = body.comment?.trim() ? body.comment.trim() : null;
      const summary = JSON.parse(record.row.summary) as ReportSummary;

      const outcome = await writeTransaction(deps, within, async (transaction): Promise<Result<ReviewEventRow>> => {
        // Read the state again under the write lock: a review that raced this one may have moved it.
        const events = await models.ReviewEvent.findAll({ where: { versionId: record.row.id }, transaction });
        const refused = checkState(body.action, versionState(events), n, await latestNumber(models, id, transaction));
        if (refused) return refused;
        const missing = commentProblem(body.action, comment, summary);
        if (missing) return invalid([{ path: 'comment', message: missing }]);
        const event = await models.ReviewEvent.create(
          { versionId: record.row.id, actorId: viewer.id, action: body.action, comment, override: body.action === 'approve' && summary.errors > 0, createdAt: now() },
          { transaction },
        );
        await refreshStatus(id, transaction);
        return ok(event);
      });
      if (!outcome.ok) return outcome;

      // Without an outer transaction the step is committed now, and it is safe to tell people about it.
      if (!within.transaction) await notifier.reviewed(viewer, view.design, record.row, outcome.value);
      const after = await loadDesignView(models, viewer, id, within.transaction);
      const updated = after && findVersion(after, n);
      if (!after || !updated) throw new Error(`design ${id} not readable right after a review step`);
      return ok({ review: toReview(updated, after.people), design: toDesignDto(after, viewer) });
    },
  };

  async function refreshStatus(designId: number, transaction: NonNullable<Within['transaction']>): Promise<void> {
    const versions = await models.DesignVersion.findAll({ attributes: ['id', 'number'], where: { designId }, transaction });
    const events = await models.ReviewEvent.findAll({ where: { versionId: versions.map((v) => v.id) }, transaction });
    const status = designStatus(versions.map((v) => ({ number: v.number, events: events.filter((e) => e.versionId === v.id) })));
    await models.Design.update({ status, updatedAt: now() }, { where: { id: designId }, transaction });
  }
}

/**
 * Four eyes: a 403 when `viewerId` saved this version, or any version of the design with the same
 * content. A 403 like the role checks (docs/api.md: the person may not do this; someone else may), not
 * a 409: no change of the version's state would make it allowed.
 */
function ownContent(all: readonly VersionRecord[], record: VersionRecord, viewerId: number): Failure | null {
  const n = record.row.number;
  if (record.row.authorId === viewerId) return fail('forbidden', `You saved version ${n} yourself, so someone else has to review it.`);
  const twin = all.find((v) => v.row.authorId === viewerId && v.row.contentHash === record.row.contentHash);
  if (!twin) return null;
  return fail('forbidden', `Version ${n} has the same content as version ${twin.row.number}, which you saved, so someone else has to review it.`);
}

function checkState(action: ReviewBody['action'], state: ReturnType<typeof versionState>, n: number, latest: number | null): Failure | null {
  if (action === 'submit') {
    if (state !== 'draft') return fail('conflict', `Version ${n} is ${STATE_WORDS[state]}; only a draft can be submitted.`);
    if (latest !== n) return fail('conflict', `Version ${n} is not the latest; submit version ${latest} instead.`);
    return null;
  }
  if (state !== 'in-review') {
    return fail('conflict', `Version ${n} is ${STATE_WORDS[state]}; only a version in review can be approved or sent back.`);
  }
  return null;
}

function commentProblem(action: ReviewBody['action'], comment: string | null, summary: ReportSummary): string | null {
  if (comment) return null;
  if (action === 'request-changes') return 'Say what should change, so the designer knows what to fix';
  if (action === 'approve' && summary.errors > 0) {
    return `The analysis found ${summary.errors} error${summary.errors === 1 ? '' : 's'} in this version; explain why you approve it anyway`;
  }
  return null;
}

export type ReviewService = ReturnType<typeof createReviewService>;
