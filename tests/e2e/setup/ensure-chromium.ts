/**
 * Browser tests run in Debian's chromium, never a downloaded browser. When it is missing this
 * installs it (as root) or stops with the command to run: the browser tests are never skipped.
 */
import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const chromium = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
const INSTALL = 'apt-get update && apt-get install -y chromium';

function main(): void {
  if (existsSync(chromium)) {
    console.log(`browser tests use ${chromium}`);
    return;
  }
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`No chromium at ${chromium}. Install Debian's chromium, then run the tests again:\n  sudo ${INSTALL}`);
    process.exit(1);
  }
  console.log(`No chromium at ${chromium}; installing Debian's package: ${INSTALL}`);
  execSync(INSTALL, { stdio: 'inherit', shell: '/bin/sh' });
  if (!existsSync(chromium)) {
    console.error(`apt-get finished but ${chromium} is still missing. Set CHROMIUM_PATH to the browser's path.`);
    process.exit(1);
  }
}

main();
