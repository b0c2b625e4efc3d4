import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { ROLES, type Role } from '@/shared/roles';

export interface InvitationRow extends Model<InferAttributes<InvitationRow>, InferCreationAttributes<InvitationRow>> {
  id: CreationOptional<number>;
  teamId: number;
  email: string;
  role: Role;
  tokenHash: string;
  invitedById: number | null;
  expiresAt: Date;
  acceptedAt: CreationOptional<Date | null>;
  revokedAt: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export function defineInvitation(sequelize: Sequelize): ModelStatic<InvitationRow> {
  return sequelize.define<InvitationRow>(
    'Invitation',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        set(this: InvitationRow, value: string) {
          this.setDataValue('email', value.trim().toLowerCase());
        },
      },
      role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      invitedById: { type: DataTypes.INTEGER, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'invitations' },
  );
}
