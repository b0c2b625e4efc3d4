import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * The full analysis report stored with each version, computed once when the version is saved
 * (versions never change, so neither does their report). Versions saved before this migration keep
 * a null report: the immutability triggers refuse to fill it in, and the report route analyses
 * their document again on each request instead (server/services/designs/versions.ts).
 * ADD COLUMN changes the table, not its rows, so the UPDATE trigger does not fire.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('design_versions', 'report', { type: DataTypes.TEXT, allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  // SQLite 3.35+ drops a column in place; removeColumn would rebuild the table and its triggers.
  await qi.sequelize.query('ALTER TABLE design_versions DROP COLUMN report');
};
