import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';

export interface TeamRow extends Model<InferAttributes<TeamRow>, InferCreationAttributes<TeamRow>> {
  id: CreationOptional<number>;
  name: string;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineTeam(sequelize: Sequelize): ModelStatic<TeamRow> {
  return sequelize.define<TeamRow>(
    'Team',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'teams' },
  );
}
