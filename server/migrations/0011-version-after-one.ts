import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * The after-one-failure analysis (docs/api.md `--after-one`) stored with each version as JSON text, computed
 * in the analysis process when the version is saved, beside its report (0006). Null on versions saved
 * before, and on a version whose after-one analysis did not finish within the save's budget: the
 * after-one route then computes it in the analysis pool on each request, and nothing is written back.
 * ADD COLUMN changes the table, not its rows, so the UPDATE trigger does not fire.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('design_versions', 'afterOne', { type: DataTypes.TEXT, allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE design_versions DROP COLUMN afterOne');
};
