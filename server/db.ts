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
  const inMemory = storage === ':memory:';
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    storage,
    logging: false,
    pool: inMemory ? { max: 1, min: 1, idle: Number.MAX_SAFE_INTEGER } : { max: 5 },
  });
  withBusyTimeout(sequelize);
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
