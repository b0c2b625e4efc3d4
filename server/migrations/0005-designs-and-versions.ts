import { DataTypes } from 'sequelize';
import { allowChanges, refuseChanges } from './immutable';
import type { Migration } from './types';

/**
 * Designs, their numbered versions and the review events on those versions.
 *
 * Versions and review events are append-only: triggers refuse any UPDATE or DELETE, so not even a
 * future bug in a service can rewrite history (restoring an old version makes a new one). The
 * unique (designId, number) index is the last guard against two saves taking the same number.
 */
const IMMUTABLE = ['design_versions', 'review_events'] as const;

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('designs', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    teamId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' } },
    name: { type: DataTypes.STRING(120), allowNull: false },
    site: { type: DataTypes.STRING(120), allowNull: true },
    status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
    createdById: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('designs', ['teamId']);

  await qi.createTable('design_versions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    designId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' } },
    number: { type: DataTypes.INTEGER, allowNull: false },
    document: { type: DataTypes.TEXT, allowNull: false },
    message: { type: DataTypes.STRING(500), allowNull: false },
    authorId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    summary: { type: DataTypes.TEXT, allowNull: false },
    contentHash: { type: DataTypes.STRING(64), allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('design_versions', ['designId', 'number'], { unique: true, name: 'design_versions_design_number' });

  await qi.createTable('review_events', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    versionId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'design_versions', key: 'id' } },
    actorId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    action: { type: DataTypes.STRING(24), allowNull: false },
    comment: { type: DataTypes.TEXT, allowNull: true },
    override: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('review_events', ['versionId']);

  for (const table of IMMUTABLE) await refuseChanges(qi, table);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of IMMUTABLE) await allowChanges(qi, table);
  await qi.dropTable('review_events');
  await qi.dropTable('design_versions');
  await qi.dropTable('designs');
};
