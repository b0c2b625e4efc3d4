import { execFileSync, execSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/**
 * The PDF tests read the pack with Debian's poppler-utils (`pdftotext`, `pdftoppm`), an outside
 * reader of the PDF rather than our own. When they are missing this installs them (as root, as the
 * browser tests install chromium) or fails with the command to run: the tests are never skipped.
 */
const INSTALL = 'apt-get install -y poppler-utils || (apt-get update && apt-get install -y poppler-utils)';

export function ensurePoppler(): void {
  if (existsSync('/usr/bin/pdftotext') && existsSync('/usr/bin/pdftoppm')) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) throw new Error(`poppler-utils is missing. Install it, then run the tests again:\n  sudo ${INSTALL}`);
  execSync(INSTALL, { stdio: 'ignore', shell: '/bin/sh' });
  if (!existsSync('/usr/bin/pdftotext')) throw new Error('apt-get finished but pdftotext is still missing.');
}

/** The text of each page (pdftotext separates pages with a form feed). */
export function pdfPages(pdf: Buffer): string[] {
  const text = execFileSync('/usr/bin/pdftotext', ['-enc', 'UTF-8', '-', '-'], { input: pdf, maxBuffer: 256 * 1024 * 1024 }).toString('utf8');
  const pages = text.split('\f');
  if (pages.at(-1)?.trim() === '') pages.pop();
  return pages;
}

/** Page `page` (1-based) rendered to PNG at `dpi`. */
export function pdfPagePng(pdf: Buffer, page = 1, dpi = 72): Buffer {
  const dir = mkdtempSync(path.join(tmpdir(), 'cablewright-pdf-'));
  try {
    writeFileSync(path.join(dir, 'in.pdf'), pdf);
    execFileSync('/usr/bin/pdftoppm', ['-png', '-r', String(dpi), '-f', String(page), '-l', String(page), '-singlefile', path.join(dir, 'in.pdf'), path.join(dir, 'out')]);
    return readFileSync(path.join(dir, 'out.png'));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
