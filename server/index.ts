import type { Server } from 'node:http';
import { closeSharedPools } from './analysis/pool';
import { createApp } from './app';
import { loadConfigOrExit, type Config } from './config';
import { openDatabase } from './db';
import { createMailer } from './mail/mailer';
import { migrate } from './migrate';
import { seedDemo, type DemoAccount } from './seed';
import { closeWorkbookPool } from './services/build-sheet/xlsx-pool';
import { closePhotoPool } from './services/photos/photo-pool';
import { closeHandoverPool } from './services/handover/pool';
import { createPasswords } from './services/passwords';

export type RunningServer = { url: string; close: () => Promise<void> };

/** Open and migrate the database, seed the demo when asked, start mail, and listen on config.port. */
export async function startServer(config: Config): Promise<RunningServer> {
  if (config.sessionSecretGenerated) {
    console.log('Note: SESSION_SECRET is not set, so a random one is used; sign-ins end when the server restarts.');
  }
  const sequelize = await openDatabase(config.databasePath);
  const applied = await migrate(sequelize);
  console.log(
    `Database ${describeDatabase(config.databasePath)}: ${applied.length ? `applied ${applied.length} migration(s): ${applied.join(', ')}` : 'up to date'}`,
  );
  let accounts: DemoAccount[] = [];
  if (config.seed === 'demo') {
    const outcome = await seedDemo(sequelize, createPasswords(config.bcryptCost));
    accounts = outcome.accounts;
    console.log(outcome.seeded ? 'Seeded the demo teams into the empty database.' : 'Database already has users: demo seed skipped.');
  }
  const mailer = await createMailer(config);
  console.log(`Mail: ${mailer.description}${mailer.mailbox ? ' (admins read it at /api/dev/mail)' : ''}`);
  if (config.isProduction && mailer.mailbox) console.warn('Warning: MAIL=fake in production; invitations reach nobody.');

  const { workers, timeoutMs, maxOldMb } = config.analysis;
  console.log(`Analysis: up to ${workers} process${workers === 1 ? '' : 'es'}, at most ${timeoutMs} ms and ${maxOldMb} MB per document`);
  const app = createApp({ sequelize, mailer, config });
  const server = await listen(app, config.port);
  const url = config.appUrl;
  console.log(`Cablewright is running at ${url}`);
  printAccounts(accounts);

  return {
    url,
    async close() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeIdleConnections();
      });
      await mailer.close();
      await closeWorkbookPool();
      await closeSharedPools();
      await closePhotoPool();
      await closeHandoverPool();
      await sequelize.close();
    },
  };
}

function listen(app: ReturnType<typeof createApp>, port: number): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = app.listen(port);
    server.once('listening', () => resolve(server));
    server.once('error', (error: NodeJS.ErrnoException) => {
      reject(error.code === 'EADDRINUSE' ? new StartError(`Port ${port} is in use. Set PORT to a free port.`) : error);
    });
  });
}

export class StartError extends Error {}

/** The database as the log may name it: a PostgreSQL URL without its password. */
function describeDatabase(location: string): string {
  if (!/^postgres(ql)?:\/\//i.test(location)) return location;
  const url = new URL(location);
  if (url.password) url.password = '***';
  return url.toString();
}

function printAccounts(accounts: DemoAccount[]): void {
  if (accounts.length === 0) return;
  console.log('\nDemo accounts (password for all: %s):', accounts[0].password);
  for (const a of accounts) console.log(`  ${a.role.padEnd(10)} ${a.email.padEnd(26)} ${a.name}, ${a.team}`);
  console.log('');
}

/** Stop cleanly on Ctrl-C or a service manager's TERM; force the exit if closing hangs. */
export function closeOnSignals(running: RunningServer): void {
  let closing = false;
  const stop = (signal: NodeJS.Signals) => {
    if (closing) return;
    closing = true;
    console.log(`\n${signal}: shutting down…`);
    setTimeout(() => process.exit(1), 5000).unref();
    running.close().then(
      () => process.exit(0),
      (error) => {
        console.error('Shutdown failed:', error);
        process.exit(1);
      },
    );
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

/** Entry point of `npm run server` (and, after the build step, `npm start`). */
export async function main(): Promise<void> {
  const config = loadConfigOrExit();
  try {
    closeOnSignals(await startServer(config));
  } catch (error) {
    console.error(`Cablewright could not start: ${error instanceof StartError ? error.message : String(error)}`);
    process.exit(1);
  }
}

if (require.main === module) void main();
