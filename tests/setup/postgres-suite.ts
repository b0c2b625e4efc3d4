/**
 * `npm run test:postgres [-- test files]`: the server suite (tests/server, or the files named) against a throwaway
 * PostgreSQL cluster from Debian's `postgresql` package. Installs the package with apt-get when it
 * is missing and this runs as root (as the browser tests do for chromium), otherwise stops with the
 * command to run. The cluster lives in a temporary folder, listens on 127.0.0.1 only, runs as the
 * `postgres` user when this runs as root (initdb refuses root), and is stopped and removed at the end.
 */
import { execFileSync, execSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir, userInfo } from 'node:os';
import path from 'node:path';

const INSTALL = 'apt-get update && apt-get install -y postgresql';
const PORT = Number(process.env.TEST_POSTGRES_PORT ?? 8161);
const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

function binDir(): string | null {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return null;
  const versions = readdirSync(root).filter((v) => existsSync(path.join(root, v, 'bin', 'initdb')));
  versions.sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(root, versions[0], 'bin') : null;
}

function ensurePostgres(): string {
  const found = binDir();
  if (found) return found;
  if (!isRoot) {
    console.error(`PostgreSQL is not installed. Install Debian's package, then run this again:\n  sudo ${INSTALL}`);
    process.exit(1);
  }
  console.log(`No PostgreSQL; installing Debian's package: ${INSTALL}`);
  execSync(INSTALL, { stdio: 'inherit', shell: '/bin/sh' });
  const installed = binDir();
  if (!installed) {
    console.error('apt-get finished but no initdb under /usr/lib/postgresql/*/bin.');
    process.exit(1);
  }
  return installed;
}

/** Run a PostgreSQL program as the cluster's owner: `postgres` when this is root, this user otherwise. */
function asOwner(program: string, args: string[]): void {
  if (isRoot) execFileSync('runuser', ['-u', 'postgres', '--', program, ...args], { stdio: 'inherit' });
  else execFileSync(program, args, { stdio: 'inherit' });
}

function main(): void {
  const bin = ensurePostgres();
  const dir = mkdtempSync(path.join(tmpdir(), 'cw-postgres-'));
  const data = path.join(dir, 'data');
  const owner = isRoot ? 'postgres' : userInfo().username;
  if (isRoot) {
    const ids = execFileSync('id', ['-u', 'postgres']).toString().trim();
    const gid = execFileSync('id', ['-g', 'postgres']).toString().trim();
    chownSync(dir, Number(ids), Number(gid));
  }
  let started = false;
  let status = 1;
  try {
    asOwner(path.join(bin, 'initdb'), ['-D', data, '-A', 'trust', '-U', owner, '--no-sync']);
    // fsync off: a throwaway cluster for tests, never for data anyone keeps.
    asOwner(path.join(bin, 'pg_ctl'), ['-D', data, '-o', `-p ${PORT} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200`, '-l', path.join(dir, 'log'), '-w', 'start']);
    started = true;
    const url = `postgres://${owner}@127.0.0.1:${PORT}/postgres`;
    console.log(`PostgreSQL ${path.basename(path.dirname(bin))} on 127.0.0.1:${PORT}; running tests/server against it`);
    const started_at = Date.now();
    const jest = spawnSync('npx', ['jest', '--selectProjects', 'node', '--runInBand', ...(process.argv.length > 2 ? process.argv.slice(2) : ['tests/server'])], {
      stdio: 'inherit',
      env: { ...process.env, TEST_DATABASE_URL: url },
    });
    status = jest.status ?? 1;
    console.log(`tests/server on PostgreSQL: ${status === 0 ? 'passed' : 'FAILED'} in ${((Date.now() - started_at) / 60000).toFixed(1)} min`);
  } finally {
    if (started) asOwner(path.join(bin, 'pg_ctl'), ['-D', data, '-m', 'immediate', '-w', 'stop']);
    rmSync(dir, { recursive: true, force: true });
  }
  process.exit(status);
}

main();
