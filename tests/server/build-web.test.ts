import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { buildWeb, hashSources } from '@/server/build-web';

let root: string;
const write = (file: string, text: string) => {
  mkdirSync(path.dirname(path.join(root, file)), { recursive: true });
  writeFileSync(path.join(root, file), text);
};

beforeEach(() => {
  root = mkdtempSync(path.join(tmpdir(), 'cw-build-'));
  write('app/index.tsx', 'export default 1;');
  write('shared/roles.ts', 'export const x = 1;');
  write('app.json', '{}');
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

describe('the web build step', () => {
  it('hashes the web sources: same files, same hash; a changed or added source, a new hash', () => {
    const first = hashSources(root);
    expect(hashSources(root)).toBe(first);
    write('app/index.tsx', 'export default 2;');
    const changed = hashSources(root);
    expect(changed).not.toBe(first);
    write('components/ui/button.tsx', 'export {}');
    expect(hashSources(root)).not.toBe(changed);
  });

  it('ignores files that are not part of the web app (server/, tests/)', () => {
    const before = hashSources(root);
    write('server/index.ts', 'console.log(1)');
    write('tests/server/x.test.ts', '');
    expect(hashSources(root)).toBe(before);
  });

  it('skips the export when dist/web was built from the same sources', () => {
    write('dist/web/index.html', '<!doctype html>');
    write('dist/web/.source-hash', `${hashSources(root)}\n`);
    expect(buildWeb({ root })).toEqual({ built: false, reason: expect.stringMatching(/^web app is up to date/) });
  });
});
