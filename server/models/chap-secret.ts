import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { refuseChanges } from './design-version';

/** CHAP secrets, sealed (migration 0012): `sealed` is AES-256-GCM ciphertext, never the secret. */
export type SecretDirection = 'initiator' | 'target';

export interface ChapSecretRow extends Model<InferAttributes<ChapSecretRow>, InferCreationAttributes<ChapSecretRow>> {
  id: CreationOptional<number>;
  designId: number;
  hostId: string;
  direction: SecretDirection;
  sealed: string;
  length: number;
  createdById: number;
  createdAt: Date;
}

/** One showing of secrets: who, when, which host (null: all). Append-only. */
export interface SecretRevealRow extends Model<InferAttributes<SecretRevealRow>, InferCreationAttributes<SecretRevealRow>> {
  id: CreationOptional<number>;
  designId: number;
  userId: number;
  hostId: string | null;
  count: number;
  createdAt: Date;
}

export function defineChapSecret(sequelize: Sequelize): ModelStatic<ChapSecretRow> {
  return sequelize.define<ChapSecretRow>(
    'ChapSecret',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      designId: { type: DataTypes.INTEGER, allowNull: false },
      hostId: { type: DataTypes.STRING(200), allowNull: false },
      direction: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [['initiator', 'target']] } },
      sealed: { type: DataTypes.TEXT, allowNull: false },
      length: { type: DataTypes.INTEGER, allowNull: false },
      createdById: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    { tableName: 'chap_secrets', timestamps: false },
  );
}

export function defineSecretReveal(sequelize: Sequelize): ModelStatic<SecretRevealRow> {
  const model = sequelize.define<SecretRevealRow>(
    'SecretReveal',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      designId: { type: DataTypes.INTEGER, allowNull: false },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      hostId: { type: DataTypes.STRING(200), allowNull: true },
      count: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    { tableName: 'chap_secret_reveals', timestamps: false },
  );
  refuseChanges(model, 'A record of who saw the secrets never changes.');
  return model;
}
