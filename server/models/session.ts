import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';

/** The row connect-session-sequelize stores (passed to it as `table`), matching migration 0003. */
export interface SessionRow extends Model<InferAttributes<SessionRow>, InferCreationAttributes<SessionRow>> {
  sid: string;
  expires: Date | null;
  data: string | null;
  userId: number | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const SESSION_MODEL_NAME = 'Session';

export function defineSession(sequelize: Sequelize): ModelStatic<SessionRow> {
  return sequelize.define<SessionRow>(
    SESSION_MODEL_NAME,
    {
      sid: { type: DataTypes.STRING(36), primaryKey: true },
      expires: { type: DataTypes.DATE, allowNull: true },
      data: { type: DataTypes.TEXT, allowNull: true },
      userId: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'sessions' },
  );
}
