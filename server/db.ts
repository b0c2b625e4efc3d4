import { Sequelize } from 'sequelize';
import type { Database } from 'sqlite3';

const BUSY_TIMEOUT_MS = 5000;

/**
 * Open the SQLite database at `storage` (a file path or ':memory:').
 *
 * Sequelize's sqlite dialect bypasses its pool and its afterConnect hooks: it keeps one cached
 * connection for ordinary queries and opens a fresh one per transaction. So the busy timeout is set
 * on every connection as it is handed out, and WAL (a property of the file) once at open.
 * With ':memory:' every connection would be a separate empty database; the dialect shares one
 * connection for memory databases and the pool is held at one to say so.
 */
export async function openDatabase(storage: string): Promise<Sequelize> {
  if (isPostgresUrl(storage)) return openPostgres(storage);
  const inMemory = storage === ':memory:';
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    storage,
    logging: false,
    pool: inMemory ? { max: 1, min: 1, idle: Number.MAX_SAFE_INTEGER } : { max: 5 },
  });
  withBusyTimeout(sequelize);
  oneTransactionAtATime(sequelize);
  await sequelize.authenticate();
  if (!inMemory) await sequelize.query('PRAGMA journal_mode = WAL');
  return sequelize;
}

type ConnectionManager = { getConnection: (options?: unknown) => Promise<Database> };

function withBusyTimeout(sequelize: Sequelize): void {
  const manager = (sequelize as unknown as { connectionManager: ConnectionManager }).connectionManager;
  const getConnection = manager.getConnection.bind(manager);
  const configured = new WeakSet<Database>();
  manager.getConnection = async (options?: unknown) => {
    const connection = await getConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      configured.add(connection);
    }
    return connection;
  };
}

/**
 * Run this process's managed transactions one after another. node-sqlite3 executes statements on
 * libuv's small thread pool (4 threads by default), and a connection waiting for SQLite's write lock
 * sleeps in its busy handler on one of those threads. With four transactions waiting, the one that
 * holds the lock has no thread left to commit on, and everything stalls until the busy timeout
 * turns into SQLITE_BUSY errors. Queued here, at most one transaction per process waits on the lock;
 * other processes on the same file are still kept apart by SQLite itself (BEGIN IMMEDIATE + busy timeout).
 * It also keeps ':memory:' (one shared connection) from nesting BEGINs. Savepoints (a transaction
 * inside another) join their parent and are not queued; unmanaged transactions are left alone.
 */
function oneTransactionAtATime(sequelize: Sequelize): void {
  const transaction = sequelize.transaction.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  const queued = (...args: unknown[]): Promise<unknown> => {
    const work = args.find((a) => typeof a === 'function');
    const options = typeof args[0] === 'object' && args[0] !== null ? (args[0] as { transaction?: unknown }) : {};
    if (!work || options.transaction) return transaction(...args);
    const run = tail.then(() => transaction(...args));
    tail = run.catch(() => undefined);
    return run;
  };
  (sequelize as unknown as { transaction: typeof queued }).transaction = queued;
}

/** `postgres://…` or `postgresql://…`: a PostgreSQL server instead of the SQLite file. */
export function isPostgresUrl(location: string): boolean {
  return /^postgres(ql)?:\/\//i.test(location);
}

/**
 * The same models and migrations on PostgreSQL (the `pg` driver). Its pool hands out real
 * connections, so transactions need no queue here; a save race still ends on the unique
 * (design, number) index, which PostgreSQL enforces across every app server on the database.
 */
async function openPostgres(url: string): Promise<Sequelize> {
  const sequelize = new Sequelize(url, { dialect: 'postgres', logging: false, pool: { max: 10 } });
  await sequelize.authenticate();
  return sequelize;
}
