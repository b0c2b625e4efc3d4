import { readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { openDatabase } from '@/server/db';
import { createMigrator, migrate } from '@/server/migrate';
import { MIGRATIONS } from '@/server/migrations';

let sequelize: Sequelize;
beforeEach(async () => {
  sequelize = await openDatabase(':memory:');
});
afterEach(() => sequelize.close());

const ALL_TABLES = ['SequelizeMeta', 'build_completions', 'build_marks', 'build_photos', 'build_step_marks', 'chap_secret_reveals', 'chap_secrets', 'design_versions', 'designs', 'invitations', 'review_events', 'sessions', 'teams', 'users'];
const tables = async () => (await sequelize.getQueryInterface().showAllTables()).sort();

describe('database migrations', () => {
  it('create every table on an empty database, and a second run applies nothing', async () => {
    expect(await migrate(sequelize)).toEqual(MIGRATIONS.map(([name]) => name));
    expect(await tables()).toEqual(ALL_TABLES);
    expect(await migrate(sequelize)).toEqual([]);
    expect(await tables()).toEqual(ALL_TABLES);
  });

  it('go all the way down and up again', async () => {
    await migrate(sequelize);
    await createMigrator(sequelize).down({ to: 0 });
    expect(await tables()).toEqual(['SequelizeMeta']);
    expect(await migrate(sequelize)).toHaveLength(MIGRATIONS.length);
  });

  it('list every migration file of server/migrations, in name order', () => {
    const files = readdirSync(path.join(__dirname, '../../server/migrations'))
      .filter((f) => /^\d{4}-.+\.ts$/.test(f))
      .map((f) => f.replace(/\.ts$/, ''))
      .sort();
    expect(MIGRATIONS.map(([name]) => name)).toEqual(files);
  });

  it('give the session table the columns connect-session-sequelize reads and writes', async () => {
    await migrate(sequelize);
    const columns = await sequelize.getQueryInterface().describeTable('sessions');
    // connect-session-sequelize 7 lib/model.js: sid STRING(36) primary key, expires DATE, data TEXT, plus timestamps.
    expect(Object.keys(columns).sort()).toEqual(['createdAt', 'data', 'expires', 'sid', 'updatedAt', 'userId']);
    expect(columns.sid.primaryKey).toBe(true);
  });

  it('keep e-mail addresses unique', async () => {
    await migrate(sequelize);
    const indexes = (await sequelize.getQueryInterface().showIndex('users')) as Array<{ unique: boolean; fields: Array<{ attribute: string }> }>;
    expect(indexes.some((i) => i.unique && i.fields.map((f) => f.attribute).join() === 'email')).toBe(true);
  });
});

describe('the database file', () => {
  it('uses WAL journaling and a busy timeout on a file database', async () => {
    const file = path.join(tmpdir(), `cw-wal-${process.pid}-${Date.now()}.sqlite`);
    const db = await openDatabase(file);
    try {
      const [[mode]] = (await db.query('PRAGMA journal_mode')) as [Array<{ journal_mode: string }>, unknown];
      expect(mode.journal_mode).toBe('wal');
      const [[timeout]] = (await db.query('PRAGMA busy_timeout')) as [Array<Record<string, number>>, unknown];
      expect(Object.values(timeout)[0]).toBeGreaterThanOrEqual(1000);
    } finally {
      await db.close();
      for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
    }
  });

  it('keeps one shared in-memory database across transactions', async () => {
    await migrate(sequelize);
    const count = await sequelize.transaction(async (transaction) => {
      const [rows] = await sequelize.query("SELECT count(*) AS n FROM sqlite_master WHERE name = 'users'", { transaction });
      return (rows as Array<{ n: number }>)[0].n;
    });
    expect(count).toBe(1);
  });
});
