import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { runAnalyzeCli, USAGE } from '@/shared/cli/run';
import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';

function run(args: string[], files: Record<string, string>) {
  const out: string[] = [];
  const err: string[] = [];
  const code = runAnalyzeCli(args, {
    readFile: (path) => {
      if (!(path in files)) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
      return files[path];
    },
    out: (line) => out.push(line),
    err: (line) => err.push(line),
  });
  return { code, out, err };
}

const v1 = JSON.stringify(harborRoadV1());
const v2 = JSON.stringify(harborRoadV2());

describe('the analyze command', () => {
  it('prints one report as JSON and exits 0', () => {
    const result = run(['v1.json'], { 'v1.json': v1 });
    expect(result.code).toBe(0);
    expect(JSON.parse(result.out.join('\n'))).toEqual(analyze(harborRoadV1()));
    expect(result.err).toEqual([]);
  });

  it('prints one compact line per file in the order given', () => {
    const result = run(['v2.json', 'v1.json'], { 'v1.json': v1, 'v2.json': v2 });
    expect(result.code).toBe(0);
    expect(result.out).toHaveLength(2);
    expect(result.out.map((line) => JSON.parse(line))).toEqual([analyze(harborRoadV2()), analyze(harborRoadV1())]);
  });

  it('puts an error line in place of an invalid file, says why on stderr and exits 2 at the end', () => {
    const broken = JSON.stringify({ ...harborRoadV2(), cables: [{ id: 'x', a: 'nowhere', b: 'fab-a.p1', media: 'cat6a' }] });
    const result = run(['bad.json', 'v2.json', 'missing.json', 'junk.json'], { 'bad.json': broken, 'v2.json': v2, 'junk.json': '{oops' });
    expect(result.code).toBe(2);
    expect(result.out).toHaveLength(4);
    expect(JSON.parse(result.out[0])).toEqual({ file: 'bad.json', errors: [{ path: 'cables.0.a', message: 'No port has the id "nowhere".' }] });
    expect(JSON.parse(result.out[1])).toEqual(analyze(harborRoadV2()));
    expect(JSON.parse(result.out[2]).errors[0].message).toContain('could not be read');
    expect(JSON.parse(result.out[3]).errors[0].message).toContain('not JSON');
    expect(result.err).toEqual([
      'bad.json is not a valid topology document (1 problem); the first at cables.0.a: No port has the id "nowhere".',
      'missing.json could not be read: there is no such file.',
      expect.stringMatching(/^junk\.json is not JSON: .+\.$/),
    ]);
  });

  it('reads a file that begins with a UTF-8 byte-order mark', () => {
    const result = run(['v2.json'], { 'v2.json': `\uFEFF${v2}` });
    expect(result.code).toBe(0);
    expect(JSON.parse(result.out.join('\n'))).toEqual(analyze(harborRoadV2()));
  });

  it('analyses what-if failures given with --failed', () => {
    const result = run(['v2.json', '--failed=fab-a'], { 'v2.json': v2 });
    expect(JSON.parse(result.out[0]).hosts.every((p: { redundant: boolean }) => !p.redundant)).toBe(true);
  });

  it('prints usage and exits 2 without files', () => {
    expect(run([], {})).toEqual({ code: 2, out: [], err: [USAGE] });
  });

  it('runs as npm run analyze does, on the committed fixture', () => {
    const root = join(__dirname, '..', '..');
    const result = spawnSync(process.execPath, [require.resolve('tsx/cli'), 'shared/cli/analyze.ts', 'shared/fixtures/harbor-road-v1.json'], {
      cwd: root,
      encoding: 'utf8',
    });
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.failures.map((f: { unit: string }) => f.unit)).toEqual(expect.arrayContaining(['fab-a', 'cam-rec-2.card-1']));
  }, 30000);

  it('runs several files as one process: JSON Lines on stdout, sentences on stderr, exit 2 at the end', () => {
    const root = join(__dirname, '..', '..');
    const files = ['shared/fixtures/harbor-road-v2.json', 'shared/fixtures/no-such-design.json', 'shared/fixtures/harbor-road-v1.json'];
    const result = spawnSync(process.execPath, [require.resolve('tsx/cli'), 'shared/cli/analyze.ts', ...files], { cwd: root, encoding: 'utf8' });
    expect(result.status).toBe(2);
    const lines = result.stdout.trimEnd().split('\n').map((line) => JSON.parse(line));
    expect(lines).toEqual([analyze(harborRoadV2()), { file: files[1], errors: [{ path: '', message: 'The file could not be read (there is no such file).' }] }, analyze(harborRoadV1())]);
    expect(result.stderr.trimEnd().split('\n')).toEqual(['shared/fixtures/no-such-design.json could not be read: there is no such file.']);
  }, 30000);
});
