import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * The table connect-session-sequelize reads and writes (its default model is sid STRING(36) primary key,
 * expires DATE, data TEXT, plus Sequelize timestamps), with a userId column of our own so that removing
 * a member can end that member's sessions.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    userId: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('sessions', ['expires']);
  await qi.addIndex('sessions', ['userId']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('sessions');
};
