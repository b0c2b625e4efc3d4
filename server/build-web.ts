import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** What the web bundle is made from; a change to any of these means the export is stale. */
const SOURCES = ['app', 'components', 'lib', 'shared', 'assets', 'app.json', 'babel.config.js', 'package-lock.json', 'tsconfig.json'];
const OUTPUT = 'dist/web';
const HASH_FILE = '.source-hash';

/** sha256 over every source file's path and bytes, in a fixed order. */
export function hashSources(root: string): string {
  const hash = createHash('sha256');
  for (const file of SOURCES.flatMap((entry) => listFiles(root, entry)).sort()) {
    hash.update(file).update('\0').update(readFileSync(path.join(root, file))).update('\0');
  }
  return hash.digest('hex');
}

function listFiles(root: string, relative: string): string[] {
  const full = path.join(root, relative);
  if (!existsSync(full)) return [];
  if (!statSync(full).isDirectory()) return [relative];
  return readdirSync(full)
    .filter((name) => name !== '.DS_Store')
    .flatMap((name) => listFiles(root, path.join(relative, name)));
}

export type BuildOutcome = { built: boolean; reason: string };

/** Export the web app to dist/web unless it was already exported from these exact sources (or `force`). */
export function buildWeb({ root = process.cwd(), force = false } = {}): BuildOutcome {
  const hash = hashSources(root);
  const hashFile = path.join(root, OUTPUT, HASH_FILE);
  const previous = existsSync(hashFile) ? readFileSync(hashFile, 'utf8').trim() : null;
  if (!force && previous === hash && existsSync(path.join(root, OUTPUT, 'index.html'))) {
    return { built: false, reason: `web app is up to date (${OUTPUT}, sources ${hash.slice(0, 12)})` };
  }
  const why = force ? 'forced' : previous ? 'sources changed' : 'no build yet';
  console.log(`Building the web app (${why}): npx expo export --platform web --output-dir ${OUTPUT}`);
  const started = Date.now();
  const run = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', OUTPUT], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, CI: '1', EXPO_OFFLINE: '1' },
  });
  if (run.status !== 0) {
    throw new Error(`expo export failed (exit ${run.status ?? run.signal}); the web app was not rebuilt`);
  }
  writeFileSync(hashFile, `${hash}\n`);
  return { built: true, reason: `built ${OUTPUT} in ${((Date.now() - started) / 1000).toFixed(1)} s (${why})` };
}

if (require.main === module) {
  try {
    console.log(buildWeb({ force: process.argv.includes('--force') }).reason);
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
}
