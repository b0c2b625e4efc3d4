import { Op, type Sequelize, type Transaction } from 'sequelize';
import type { BuildMarkRow, BuildStepMarkRow, Models } from '@/server/models';

/**
 * The current state of a record: each cable's and each step's latest mark. "Latest" is the highest
 * row id — the order marks were committed in under the write lock — not the clock, which a phone
 * or a server can set back.
 */
function newestPer(sequelize: Sequelize, table: 'build_marks' | 'build_step_marks', column: 'cableId' | 'stepId', versionId: number) {
  if (!Number.isSafeInteger(versionId)) throw new Error('versionId must be an integer');
  return { [Op.in]: sequelize.literal(`(SELECT MAX(id) FROM ${table} WHERE versionId = ${versionId} GROUP BY ${column})`) };
}

export async function latestCableMarks(models: Models, sequelize: Sequelize, versionId: number, transaction?: Transaction): Promise<BuildMarkRow[]> {
  return models.BuildMark.findAll({ where: { id: newestPer(sequelize, 'build_marks', 'cableId', versionId) }, order: [['id', 'ASC']], transaction });
}

export async function latestStepMarks(models: Models, sequelize: Sequelize, versionId: number, transaction?: Transaction): Promise<BuildStepMarkRow[]> {
  return models.BuildStepMark.findAll({ where: { id: newestPer(sequelize, 'build_step_marks', 'stepId', versionId) }, order: [['id', 'ASC']], transaction });
}

/**
 * Every cable of `cableIds` tested and every step of `stepIds` done, by their latest marks. Marks of
 * ids the version does not have cannot exist (the service refuses them), but are ignored all the same.
 */
export async function isComplete(
  models: Models,
  sequelize: Sequelize,
  versionId: number,
  expected: { cableIds: ReadonlySet<string>; stepIds: ReadonlySet<string> },
  transaction?: Transaction,
): Promise<boolean> {
  const cables = await latestCableMarks(models, sequelize, versionId, transaction);
  const tested = cables.filter((m) => m.state === 'tested' && expected.cableIds.has(m.cableId)).length;
  if (tested < expected.cableIds.size) return false;
  const steps = await latestStepMarks(models, sequelize, versionId, transaction);
  return steps.filter((m) => m.done && expected.stepIds.has(m.stepId)).length === expected.stepIds.size;
}
