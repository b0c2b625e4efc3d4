import type { Transaction } from 'sequelize';
import type { DesignVersionRow, Models } from '@/server/models';
import type { PreparedText } from '@/server/services/analysis';

/**
 * A document ready to be stored: validated, analysed, serialised and hashed by the analysis
 * (server/services/analysis.ts) before the write transaction, so the write lock is held for the few
 * statements that need it, not for a graph analysis.
 */
export type PreparedDocument = PreparedText;

/** The highest version number of a design, or null when it has none yet. */
export async function latestNumber(models: Models, designId: number, transaction?: Transaction): Promise<number | null> {
  const row = await models.DesignVersion.findOne({
    attributes: ['number'],
    where: { designId },
    order: [['number', 'DESC']],
    transaction,
  });
  return row ? row.number : null;
}

/** Insert the next version on top of the latest; the caller holds the write transaction. */
export async function appendVersion(
  models: Models,
  transaction: Transaction,
  input: { designId: number; authorId: number; message: string; prepared: PreparedDocument; at: Date },
): Promise<DesignVersionRow> {
  const latest = await latestNumber(models, input.designId, transaction);
  const row = await models.DesignVersion.create(
    {
      designId: input.designId,
      number: (latest ?? 0) + 1,
      document: input.prepared.json,
      message: input.message,
      authorId: input.authorId,
      summary: JSON.stringify(input.prepared.summary),
      contentHash: input.prepared.hash,
      report: input.prepared.reportJson,
      afterOne: input.prepared.afterOneJson,
      createdAt: input.at,
    },
    { transaction },
  );
  await models.Design.update({ updatedAt: input.at }, { where: { id: input.designId }, transaction });
  return row;
}
