import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runAnalyzeCli, USAGE } from '@/shared/cli/run';
import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { oneSwitch } from './helpers/topologies';
import { withIdOfKind } from './helpers/hostile';
import { validateTopology } from '@/shared/topology/validate';
import type { Topology } from '@/shared/topology/schema';

/** Harbor Road v1 with a switch called constructor, a card called __proto__ and a port called toString. */
function hostileHarborRoad(): Topology {
  let doc = withIdOfKind(harborRoadV1(), 'switch', 'constructor')!;
  doc = withIdOfKind(doc, 'adapter', '__proto__')!;
  return withIdOfKind(doc, 'port', 'toString')!;
}

function checked(doc: Topology): Topology {
  const result = validateTopology(JSON.parse(JSON.stringify(doc)));
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.doc;
}

function run(args: string[], files: Record<string, string>) {
  const out: string[] = [];
  const err: string[] = [];
  const code = runAnalyzeCli(args, {
    readFile: (path) => {
      if (!Object.hasOwn(files, path)) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
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

  it('adds afterOneFailure with --after-one, and takes PSU and feed ids in --failed', () => {
    const doc = checked(harborRoadV2());
    doc.powerFeeds = [{ id: 'feed-a', name: 'Feed A' }];
    doc.devices.find((d) => d.id === 'fab-a')!.psus = [{ id: 'fab-a.psu1', name: 'PSU 1', feedId: 'feed-a' }];
    const text = JSON.stringify(doc);
    const result = run(['p.json', '--after-one'], { 'p.json': text });
    expect(result.code).toBe(0);
    const report = JSON.parse(result.out.join('\n'));
    expect(report.afterOneFailure).toEqual(analyze(doc, { afterOne: true }).afterOneFailure);
    expect(report.afterOneFailure.map((e: { failed: string }) => e.failed)).toEqual(expect.arrayContaining(['fab-a', 'fab-a.psu1', 'feed-a']));
    // Without the option the report is as before.
    expect('afterOneFailure' in JSON.parse(run(['p.json'], { 'p.json': text }).out.join('\n'))).toBe(false);
    const failed = run(['p.json', '--failed=feed-a'], { 'p.json': text });
    expect(JSON.parse(failed.out.join('\n'))).toEqual(analyze(doc, { failed: ['feed-a'] }));
    // Losing the feed takes fab-a down: the what-if equals failing the switch itself.
    expect(JSON.parse(failed.out.join('\n')).hosts).toEqual(analyze(doc, { failed: ['fab-a'] }).hosts);
  });

  it('prints usage and exits 2 without files', () => {
    expect(run([], {})).toEqual({ code: 2, out: [], err: [USAGE] });
  });

  it('adds up repeated --failed options, in both forms', () => {
    const both = analyze(harborRoadV2(), { failed: ['fab-a', 'fab-b'] });
    const forms = [
      ['v2.json', '--failed=fab-a', '--failed=fab-b'],
      ['v2.json', '--failed', 'fab-a', '--failed', 'fab-b'],
      ['--failed', 'fab-a,fab-b', 'v2.json'],
      ['v2.json', '--failed=fab-a', '--failed', 'fab-b,fab-a'],
    ];
    for (const args of forms) {
      const result = run(args, { 'v2.json': v2 });
      expect({ args, code: result.code, report: JSON.parse(result.out.join('\n')) }).toEqual({ args, code: 0, report: both });
    }
    // Both fabrics down: no host reaches the array any more.
    expect(both.hosts).toEqual([]);
  });

  it('refuses an id that is not a failure unit with a sentence and exit 2', () => {
    const cases: [string, string][] = [
      ['fab-c', '"fab-c" is not an id in this document.'],
      ['fab-a.p1', '"fab-a.p1" is a port, which is not a failure unit; fail its card, controller or switch, or its cable, instead.'],
      ['wms-db-1', '"wms-db-1" is a host, which is not a failure unit; fail one of its cards or cables instead.'],
      ['vault-1', '"vault-1" is an array, which is not a failure unit; fail one of its controllers instead.'],
    ];
    for (const [id, message] of cases) {
      const result = run(['v2.json', '--failed=fab-a', '--failed', id], { 'v2.json': v2 });
      expect(result.code).toBe(2);
      expect(result.out.map((line) => JSON.parse(line))).toEqual([{ file: 'v2.json', errors: [{ path: '--failed', message }] }]);
      expect(result.err).toEqual([`v2.json was not analysed: ${message}`]);
    }
  });

  it('checks the --failed ids against each file and analyses the files that have them', () => {
    const result = run(['v2.json', 'small.json', '--failed=fab-a'], { 'v2.json': v2, 'small.json': JSON.stringify(oneSwitch()) });
    expect(result.code).toBe(2);
    expect(JSON.parse(result.out[0])).toEqual(analyze(harborRoadV2(), { failed: ['fab-a'] }));
    expect(JSON.parse(result.out[1]).errors[0].path).toBe('--failed');
  });

  it('says what is wrong with the options before the usage', () => {
    expect(run(['v2.json', '--failed'], { 'v2.json': v2 })).toEqual({ code: 2, out: [], err: [`--failed needs the ids of the units to fail.\n${USAGE}`] });
    expect(run(['v2.json', '--fail=fab-a'], { 'v2.json': v2 }).err).toEqual([`"--fail=fab-a" is not an option of this command.\n${USAGE}`]);
    expect(run(['--failed=fab-a'], {}).err).toEqual([`Name at least one document file.\n${USAGE}`]);
  });

  it('reads every argument after -- as a file, and finds no file called constructor unless there is one', () => {
    expect(run(['--', '--failed=x'], { '--failed=x': v2 }).code).toBe(0);
    const missing = run(['constructor'], { 'v2.json': v2 });
    expect(missing.code).toBe(2);
    expect(missing.err).toEqual(['constructor could not be read: there is no such file.']);
  });

  it('fails hostile ids as units and refuses a hostile port id', () => {
    const text = JSON.stringify(hostileHarborRoad());
    const doc = checked(hostileHarborRoad());
    const result = run(['h.json', '--failed', 'constructor', '--failed=__proto__'], { 'h.json': text });
    expect(result.code).toBe(0);
    expect(JSON.parse(result.out.join('\n'))).toEqual(analyze(doc, { failed: ['constructor', '__proto__'] }));
    const port = run(['h.json', '--failed=toString'], { 'h.json': text });
    expect(port.code).toBe(2);
    expect(port.err).toEqual(['h.json was not analysed: "toString" is a port, which is not a failure unit; fail its card, controller or switch, or its cable, instead.']);
  });

  it('runs npm run analyze on a hostile file in a process of its own', () => {
    const folder = mkdtempSync(join(tmpdir(), 'cablewright-cli-'));
    try {
      const file = join(folder, 'hostile.json');
      writeFileSync(file, JSON.stringify(hostileHarborRoad()));
      const root = join(__dirname, '..', '..');
      const npm = (extra: string[]) => spawnSync('npm', ['run', '--silent', 'analyze', '--', file, ...extra], { cwd: root, encoding: 'utf8', timeout: 60000 });
      const good = npm(['--failed', 'constructor']);
      expect(good.status).toBe(0);
      const report = JSON.parse(good.stdout);
      expect(report).toEqual(analyze(checked(hostileHarborRoad()), { failed: ['constructor'] }));
      // The switch called constructor is down, so every host is left hanging off fab-b alone.
      expect(report.hosts.length).toBeGreaterThan(0);
      expect(report.hosts.every((pair: { redundant: boolean }) => !pair.redundant)).toBe(true);
      const bad = npm(['--failed=valueOf']);
      expect(bad.status).toBe(2);
      expect(bad.stderr.trim()).toBe(`${file} was not analysed: "valueOf" is not an id in this document.`);
      expect(JSON.parse(bad.stdout)).toEqual({ file, errors: [{ path: '--failed', message: '"valueOf" is not an id in this document.' }] });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  }, 90000);

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
