import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * Removing a member keeps their row: versions and review events name their author and reviewer for
 * as long as the design exists. A removed member has `removedAt` set, cannot sign in, has no
 * sessions and is left out of the members list; re-inviting them to the same team reactivates the row.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('users', 'removedAt', { type: DataTypes.DATE, allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  // SQLite 3.35+ drops a column in place; Sequelize's removeColumn would rebuild the table, and dropping
  // `users` under foreign keys would null the invitations' inviters on the way.
  await qi.sequelize.query('ALTER TABLE users DROP COLUMN removedAt');
};
