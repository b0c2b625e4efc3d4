import { Op, type Sequelize, type Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import { buildCompleteEmail } from '@/server/mail/build-email';
import type { Mailer } from '@/server/mail/mailer';
import type { BuildCompletionRow, Models, UserRow } from '@/server/models';
import type { VersionPlan } from './version-cache';
import { isComplete } from './latest';
import type { OpenedBuild } from './open';

/**
 * A record becomes complete when every cable is tested and every step done. The first time it
 * does, a build_completions row is written in the same transaction as the mark that completed it
 * (its unique version index makes it once, even across server processes), and after the commit the
 * version's author and the reviewers who approved it get an e-mail. A later mark that undoes a
 * cable or a step does not take the completion back, and completing again sends nothing.
 */
export async function recordCompletion(
  deps: { models: Models; sequelize: Sequelize },
  opened: OpenedBuild,
  plan: VersionPlan,
  finisher: User,
  at: Date,
  transaction: Transaction,
): Promise<BuildCompletionRow | null> {
  const { models, sequelize } = deps;
  const versionId = opened.record.row.id;
  if (await models.BuildCompletion.findOne({ where: { versionId }, transaction })) return null;
  if (!(await isComplete(models, sequelize, versionId, plan, transaction))) return null;
  return models.BuildCompletion.create(
    { designId: opened.view.design.id, versionId, versionNumber: opened.record.row.number, completedById: finisher.id, createdAt: at },
    { transaction },
  );
}

/** The version's author and everyone who approved it, still members, each once. */
async function recipients(models: Models, opened: OpenedBuild): Promise<UserRow[]> {
  const ids = new Set([opened.record.row.authorId, ...opened.record.events.filter((e) => e.action === 'approve').map((e) => e.actorId)]);
  return models.User.findAll({ where: { id: { [Op.in]: [...ids] }, teamId: opened.view.design.teamId, removedAt: null }, order: [['id', 'ASC']] });
}

/** Send the completion e-mails; a relay failure is logged and changes nothing (the record is the record). */
export async function announceCompletion(
  deps: { models: Models; mailer: Pick<Mailer, 'sendMail'>; appUrl: string },
  opened: OpenedBuild,
  plan: VersionPlan,
  finisher: User,
): Promise<string[]> {
  const { design } = opened.view;
  const { number } = opened.record.row;
  const problems = await deps.models.BuildMark.count({ where: { versionId: opened.record.row.id, state: 'problem' } });
  const input = {
    teamId: design.teamId,
    designName: design.name,
    site: design.site,
    number,
    finisherName: finisher.name,
    cables: plan.cableIds.size,
    steps: plan.stepIds.size,
    problems,
    link: `${deps.appUrl}/designs/${design.id}/versions/${number}`,
  };
  const sent: string[] = [];
  for (const person of await recipients(deps.models, opened)) {
    try {
      await deps.mailer.sendMail(buildCompleteEmail(input, person.email));
      sent.push(person.email);
    } catch (error) {
      console.error(`Build completion e-mail to ${person.email} could not be sent:`, (error as Error).message);
    }
  }
  return sent;
}
