import { DataTypes } from 'sequelize';
import { allowChanges, refuseChanges } from './immutable';
import type { Migration } from './types';

/**
 * The build record of an approved version, beside the immutable version: the installer's cable
 * marks, bring-up step marks, photos, and the moment the record was first complete.
 *
 * Every table is append-only, like the versions themselves: triggers refuse any UPDATE or DELETE,
 * so the history is the audit trail and a cable's current state is its latest mark. The unique
 * (version, clientId) indexes make a replayed offline queue harmless, and the unique version of
 * build_completions lets the completion e-mail go out once.
 */
const IMMUTABLE = ['build_marks', 'build_step_marks', 'build_photos', 'build_completions'] as const;

const version = {
  designId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' } },
  versionId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'design_versions', key: 'id' } },
  versionNumber: { type: DataTypes.INTEGER, allowNull: false },
};
const author = { authorId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } } };

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('build_marks', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    ...version,
    cableId: { type: DataTypes.STRING(200), allowNull: false },
    state: { type: DataTypes.STRING(16), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    ...author,
    clientId: { type: DataTypes.STRING(36), allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_marks', ['versionId', 'clientId'], { unique: true, name: 'build_marks_version_client' });
  await qi.addIndex('build_marks', ['versionId', 'cableId']);

  await qi.createTable('build_step_marks', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    ...version,
    stepId: { type: DataTypes.TEXT, allowNull: false },
    done: { type: DataTypes.BOOLEAN, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    ...author,
    clientId: { type: DataTypes.STRING(36), allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_step_marks', ['versionId', 'clientId'], { unique: true, name: 'build_step_marks_version_client' });
  await qi.addIndex('build_step_marks', ['versionId']);

  await qi.createTable('build_photos', {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    ...version,
    cableId: { type: DataTypes.STRING(200), allowNull: true },
    rackId: { type: DataTypes.STRING(200), allowNull: true },
    ...author,
    contentType: { type: DataTypes.STRING(32), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    storedName: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_photos', ['versionId']);

  await qi.createTable('build_completions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    ...version,
    completedById: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_completions', ['versionId'], { unique: true, name: 'build_completions_version' });

  for (const table of IMMUTABLE) await refuseChanges(qi, table);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of IMMUTABLE) await allowChanges(qi, table);
  for (const table of [...IMMUTABLE].reverse()) await qi.dropTable(table);
};
