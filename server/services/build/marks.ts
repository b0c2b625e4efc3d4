import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { CableMark, ParsedMarkBody, ParsedStepBody, StepMark } from '@/shared/api/build';
import type { BuildMarkRow, BuildStepMarkRow } from '@/server/models';
import { writeTransaction } from '@/server/services/designs/deps';
import { fail, invalid, ok, type Result } from '@/server/services/result';
import type { BuildDeps } from './deps';
import type { VersionPlan } from './version-cache';
import { announceCompletion, recordCompletion } from './completion';
import { loadPeople, toCableMark, toStepMark } from './dto';
import { openForMarking, type OpenedBuild } from './open';

/**
 * Writing to a build record: one cable mark or one step mark at a time, appended (never changed).
 *
 * - Installers and admins only (the route's guard); approved versions only (openForMarking).
 * - The cable or step must be one of the version's; a `problem` needs a note (the body schema).
 * - `clientId` is the phone's UUID for the mark: the same clientId again on the same version
 *   answers the stored mark (`created: false`, 200) and stores nothing, so a replayed offline queue
 *   doubles nothing. The same clientId with a different mark is a client mistake: 409.
 * - Each mark is written in one IMMEDIATE transaction (server/db.ts queues them), so concurrent
 *   marks on one cable are all kept, in commit order, and the latest is the current state.
 * - A mark that completes the record writes its completion in the same transaction; the e-mails
 *   go out after the commit.
 */
export type Written<T> = { mark: T; created: boolean };

const REUSED = 'This clientId was already used for a different mark on this version; make a new clientId for each mark.';

type Insert<R> = {
  find: (t?: Transaction) => Promise<R | null>;
  same: (row: R) => boolean;
  create: (t: Transaction) => Promise<R>;
  completes: boolean;
};

export function createMarkService(deps: BuildDeps) {
  const { models, now } = deps;

  async function append<R extends BuildMarkRow | BuildStepMarkRow>(viewer: User, opened: OpenedBuild, plan: VersionPlan, insert: Insert<R>): Promise<Result<{ row: R; created: boolean }>> {
    const answer = (row: R, created: boolean) => (created || insert.same(row) ? ok({ row, created }) : fail('conflict', REUSED));
    let completed = false;
    let outcome: Result<{ row: R; created: boolean }>;
    try {
      outcome = await writeTransaction(deps, {}, async (transaction) => {
        const existing = await insert.find(transaction);
        if (existing) return answer(existing, false);
        const row = await insert.create(transaction);
        if (insert.completes) completed = (await recordCompletion(deps, opened, plan, viewer, row.createdAt, transaction)) !== null;
        return answer(row, true);
      });
    } catch (error) {
      // Another server process stored the same clientId between our look and our insert.
      if (!(error instanceof UniqueConstraintError)) throw error;
      completed = false;
      const existing = await insert.find();
      if (!existing) throw error;
      outcome = answer(existing, false);
    }
    if (completed) await announceCompletion(deps, opened, plan, viewer);
    return outcome;
  }

  async function people(row: BuildMarkRow | BuildStepMarkRow) {
    return loadPeople(models, [row.authorId]);
  }

  return {
    async markCable(viewer: User, id: number, n: number, body: ParsedMarkBody): Promise<Result<Written<CableMark>>> {
      const opened = await openForMarking(deps, viewer, id, n);
      if (!opened.ok) return opened;
      const plan = await deps.versions.plan(opened.value.record.row.id, opened.value.doc);
      if (!plan.cableIds.has(body.cableId)) return invalid([{ path: 'cableId', message: `Version ${n} has no cable ${JSON.stringify(body.cableId)}` }]);
      const { record, view } = opened.value;
      const note = body.note || null;
      const written = await append(viewer, opened.value, plan, {
        find: (transaction) => models.BuildMark.findOne({ where: { versionId: record.row.id, clientId: body.clientId }, transaction }),
        same: (row) => row.cableId === body.cableId && row.state === body.state && row.note === note && row.authorId === viewer.id,
        create: (transaction) =>
          models.BuildMark.create(
            { designId: view.design.id, versionId: record.row.id, versionNumber: n, cableId: body.cableId, state: body.state, note, authorId: viewer.id, clientId: body.clientId, createdAt: now() },
            { transaction },
          ),
        completes: body.state === 'tested',
      });
      if (!written.ok) return written;
      return ok({ mark: toCableMark(written.value.row, await people(written.value.row)), created: written.value.created });
    },

    async markStep(viewer: User, id: number, n: number, body: ParsedStepBody): Promise<Result<Written<StepMark>>> {
      const opened = await openForMarking(deps, viewer, id, n);
      if (!opened.ok) return opened;
      const plan = await deps.versions.plan(opened.value.record.row.id, opened.value.doc);
      if (!plan.stepIds.has(body.stepId)) return invalid([{ path: 'stepId', message: `Version ${n}'s bring-up checklist has no step ${JSON.stringify(body.stepId)}` }]);
      const { record, view } = opened.value;
      const note = body.note || null;
      const written = await append(viewer, opened.value, plan, {
        find: (transaction) => models.BuildStepMark.findOne({ where: { versionId: record.row.id, clientId: body.clientId }, transaction }),
        same: (row) => row.stepId === body.stepId && row.done === body.done && row.note === note && row.authorId === viewer.id,
        create: (transaction) =>
          models.BuildStepMark.create(
            { designId: view.design.id, versionId: record.row.id, versionNumber: n, stepId: body.stepId, done: body.done, note, authorId: viewer.id, clientId: body.clientId, createdAt: now() },
            { transaction },
          ),
        completes: body.done,
      });
      if (!written.ok) return written;
      return ok({ mark: toStepMark(written.value.row, await people(written.value.row)), created: written.value.created });
    },
  };
}

export type MarkService = ReturnType<typeof createMarkService>;
