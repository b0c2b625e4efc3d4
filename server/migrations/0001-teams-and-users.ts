import { DataTypes } from 'sequelize';
import type { Migration } from './types';

const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('teams', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    teamId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'teams', key: 'id' },
      onDelete: 'CASCADE',
    },
    // Stored lowercased (the model's setter and the API schema both fold case), so the unique index is case-blind.
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('users', ['teamId']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('users');
  await qi.dropTable('teams');
};
