import { DataTypes } from 'sequelize';
import type { Migration } from './types';

/**
 * CHAP secrets of a design and the record of who saw them.
 *
 * `chap_secrets` holds one row per host and direction (`initiator`; `target` for mutual CHAP), the
 * secret only as AES-256-GCM ciphertext (server/services/secrets/crypto.ts): never the secret
 * itself. Regenerating replaces a design's rows in one transaction.
 *
 * `chap_secret_reveals` is append-only like the versions (triggers refuse UPDATE and DELETE): every
 * time someone is shown secrets, who, when, and which host (null: all of them).
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('chap_secrets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    designId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' } },
    hostId: { type: DataTypes.STRING(200), allowNull: false },
    direction: { type: DataTypes.STRING(16), allowNull: false },
    sealed: { type: DataTypes.TEXT, allowNull: false },
    length: { type: DataTypes.INTEGER, allowNull: false },
    createdById: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('chap_secrets', ['designId', 'hostId', 'direction'], { unique: true, name: 'chap_secrets_design_host_direction' });

  await qi.createTable('chap_secret_reveals', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    designId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' } },
    userId: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    hostId: { type: DataTypes.STRING(200), allowNull: true },
    count: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('chap_secret_reveals', ['designId']);
  for (const verb of ['UPDATE', 'DELETE']) {
    await qi.sequelize.query(
      `CREATE TRIGGER chap_secret_reveals_no_${verb.toLowerCase()} BEFORE ${verb} ON chap_secret_reveals ` +
        `BEGIN SELECT RAISE(ABORT, 'chap_secret_reveals rows are immutable'); END;`,
    );
  }
};

export const down: Migration = async ({ context: qi }) => {
  for (const verb of ['update', 'delete']) await qi.sequelize.query(`DROP TRIGGER IF EXISTS chap_secret_reveals_no_${verb}`);
  await qi.dropTable('chap_secret_reveals');
  await qi.dropTable('chap_secrets');
};
