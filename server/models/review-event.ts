import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { REVIEW_ACTIONS, type ReviewAction } from '@/shared/api/designs';
import { refuseChanges } from './design-version';

/** One step of a version's review thread; append-only like the versions themselves. */
export interface ReviewEventRow extends Model<InferAttributes<ReviewEventRow>, InferCreationAttributes<ReviewEventRow>> {
  id: CreationOptional<number>;
  versionId: number;
  actorId: number;
  action: ReviewAction;
  comment: string | null;
  /** An approval given although the version's stored summary had errors; the comment says why. */
  override: boolean;
  createdAt: Date;
}

export function defineReviewEvent(sequelize: Sequelize): ModelStatic<ReviewEventRow> {
  const model = sequelize.define<ReviewEventRow>(
    'ReviewEvent',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      versionId: { type: DataTypes.INTEGER, allowNull: false },
      actorId: { type: DataTypes.INTEGER, allowNull: false },
      action: { type: DataTypes.STRING(24), allowNull: false, validate: { isIn: [REVIEW_ACTIONS as unknown as string[]] } },
      comment: { type: DataTypes.TEXT, allowNull: true },
      override: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    { tableName: 'review_events', timestamps: false },
  );
  refuseChanges(model, 'A review event never changes; record a new one instead.');
  return model;
}
