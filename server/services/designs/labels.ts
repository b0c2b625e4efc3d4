import type { Transaction } from 'sequelize';
import { labelHistory, type LabelHistory } from '@/shared/labels';
import type { Cable } from '@/shared/topology/schema';
import type { Models } from '@/server/models';

/**
 * The label history of a design (shared/labels/stable.ts): the cables of each stored version,
 * oldest first. Versions are read one at a time and only their cables kept, so a long history
 * of large documents is not all in memory at once. Cables are the same in format 1 and 2.
 */
export async function loadLabelHistory(models: Models, designId: number, transaction?: Transaction): Promise<LabelHistory> {
  const rows = await models.DesignVersion.findAll({ attributes: ['id'], where: { designId }, order: [['number', 'ASC']], transaction });
  const versions: { cables: Cable[] }[] = [];
  for (const { id } of rows) {
    const [row] = await models.DesignVersion.findAll({ attributes: ['id', 'document'], where: { id }, transaction });
    if (!row) continue;
    const doc = JSON.parse(row.document) as { cables?: Cable[] };
    versions.push({ cables: Array.isArray(doc.cables) ? doc.cables : [] });
  }
  return labelHistory(versions);
}
