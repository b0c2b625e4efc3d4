import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { CABLE_STATES, PHOTO_TYPES, type CableState, type PhotoType } from '@/shared/api/build';
import { refuseChanges } from './design-version';

/**
 * The build record of a version (migration 0010): cable marks, step marks, photos and the record's
 * completion. Rows are only ever inserted — the tables' triggers refuse updates and deletes, and so
 * do these models' hooks — so a cable's current state is its latest mark and the history is whole.
 */
type VersionColumns = { designId: number; versionId: number; versionNumber: number };

export interface BuildMarkRow extends Model<InferAttributes<BuildMarkRow>, InferCreationAttributes<BuildMarkRow>>, VersionColumns {
  id: CreationOptional<number>;
  cableId: string;
  state: CableState;
  note: string | null;
  authorId: number;
  clientId: string;
  createdAt: Date;
}

export interface BuildStepMarkRow extends Model<InferAttributes<BuildStepMarkRow>, InferCreationAttributes<BuildStepMarkRow>>, VersionColumns {
  id: CreationOptional<number>;
  stepId: string;
  done: boolean;
  note: string | null;
  authorId: number;
  clientId: string;
  createdAt: Date;
}

export interface BuildPhotoRow extends Model<InferAttributes<BuildPhotoRow>, InferCreationAttributes<BuildPhotoRow>>, VersionColumns {
  id: string;
  cableId: string | null;
  rackId: string | null;
  authorId: number;
  contentType: PhotoType;
  bytes: number;
  /** The random file name under the photo folder; never the name the client sent. */
  storedName: string;
  createdAt: Date;
}

export interface BuildCompletionRow extends Model<InferAttributes<BuildCompletionRow>, InferCreationAttributes<BuildCompletionRow>>, VersionColumns {
  id: CreationOptional<number>;
  completedById: number;
  createdAt: Date;
}

const versionColumns = {
  designId: { type: DataTypes.INTEGER, allowNull: false },
  versionId: { type: DataTypes.INTEGER, allowNull: false },
  versionNumber: { type: DataTypes.INTEGER, allowNull: false },
};
const options = (tableName: string) => ({ tableName, timestamps: false });

export function defineBuildMark(sequelize: Sequelize): ModelStatic<BuildMarkRow> {
  const model = sequelize.define<BuildMarkRow>(
    'BuildMark',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      ...versionColumns,
      cableId: { type: DataTypes.STRING(200), allowNull: false },
      state: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [CABLE_STATES as unknown as string[]] } },
      note: { type: DataTypes.TEXT, allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      clientId: { type: DataTypes.STRING(36), allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    options('build_marks'),
  );
  refuseChanges(model, 'A cable mark never changes; record a new mark instead.');
  return model;
}

export function defineBuildStepMark(sequelize: Sequelize): ModelStatic<BuildStepMarkRow> {
  const model = sequelize.define<BuildStepMarkRow>(
    'BuildStepMark',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      ...versionColumns,
      stepId: { type: DataTypes.TEXT, allowNull: false },
      done: { type: DataTypes.BOOLEAN, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      clientId: { type: DataTypes.STRING(36), allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    options('build_step_marks'),
  );
  refuseChanges(model, 'A step mark never changes; record a new mark instead.');
  return model;
}

export function defineBuildPhoto(sequelize: Sequelize): ModelStatic<BuildPhotoRow> {
  const model = sequelize.define<BuildPhotoRow>(
    'BuildPhoto',
    {
      id: { type: DataTypes.STRING(36), primaryKey: true },
      ...versionColumns,
      cableId: { type: DataTypes.STRING(200), allowNull: true },
      rackId: { type: DataTypes.STRING(200), allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      contentType: { type: DataTypes.STRING(32), allowNull: false, validate: { isIn: [PHOTO_TYPES as unknown as string[]] } },
      bytes: { type: DataTypes.INTEGER, allowNull: false },
      storedName: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    options('build_photos'),
  );
  refuseChanges(model, 'A stored photo never changes; add another photo instead.');
  return model;
}

export function defineBuildCompletion(sequelize: Sequelize): ModelStatic<BuildCompletionRow> {
  const model = sequelize.define<BuildCompletionRow>(
    'BuildCompletion',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      ...versionColumns,
      completedById: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    options('build_completions'),
  );
  refuseChanges(model, 'The moment a build record was complete never changes.');
  return model;
}
