import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { ROLES, type Role } from '@/shared/roles';

export interface UserRow extends Model<InferAttributes<UserRow>, InferCreationAttributes<UserRow>> {
  id: CreationOptional<number>;
  teamId: number;
  email: string;
  name: string;
  role: Role;
  passwordHash: string;
  /** Set when an admin removed the member: the row stays so versions and reviews keep their names. */
  removedAt: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineUser(sequelize: Sequelize): ModelStatic<UserRow> {
  return sequelize.define<UserRow>(
    'User',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        unique: true,
        // Fold case here too, so no code path can store a mixed-case duplicate past the unique index.
        set(this: UserRow, value: string) {
          this.setDataValue('email', value.trim().toLowerCase());
        },
      },
      name: { type: DataTypes.STRING(120), allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      removedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'users' },
  );
}
