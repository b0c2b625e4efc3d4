import { spawnSync } from 'node:child_process';
import path from 'node:path';

// The layering rules in eslint.config.mjs, run through the real ESLint command line (its flat config is
// an ES module, which jest's module loader cannot import) against code that breaks them. Each probe is
// read from stdin and linted as if it lived at the given path, so the real tree stays clean.
const root = path.resolve(__dirname, '../..');
const eslintBin = path.join(root, 'node_modules/eslint/bin/eslint.js');

type LintResult = { filePath: string; messages: { ruleId: string | null; message: string }[] };

function eslint(args: string[], input?: string): LintResult[] {
  const run = spawnSync(process.execPath, [eslintBin, '--format', 'json', ...args], { cwd: root, input, encoding: 'utf8' });
  if (run.status !== 0 && run.status !== 1) throw new Error(`eslint failed (${run.status}): ${run.stderr}`);
  return JSON.parse(run.stdout) as LintResult[];
}

function lintAs(relativePath: string, code: string): string[] {
  // import/no-cycle needs the file on disk to walk its graph, so it is off for stdin probes; the cycle has
  // its own fixture below.
  const [result] = eslint(['--no-ignore', '--rule', 'import/no-cycle: off', '--stdin', '--stdin-filename', relativePath], code);
  return result.messages.map((m) => `${m.ruleId}: ${m.message}`);
}

describe('layering lint', () => {
  it('rejects shared/ importing a component', () => {
    const messages = lintAs('shared/topology/probe.ts', "import { Button } from '@/components/ui/Button';\nexport const x = Button;\n");
    expect(messages).toEqual([expect.stringMatching(/^import\/no-restricted-paths: .*shared\/ is pure/)]);
  });

  it('rejects the server importing client logic from lib/', () => {
    const messages = lintAs('server/services/probe.ts', "import { formatDate } from '@/lib/format';\nexport const x = formatDate;\n");
    expect(messages).toEqual([expect.stringMatching(/^import\/no-restricted-paths: .*server\/ must not import client code/)]);
  });

  it('rejects lib/ importing a component, also through a relative path', () => {
    const messages = lintAs('lib/editor/probe.ts', "import { Button } from '../../components/ui/Button';\nexport const x = Button;\n");
    expect(messages).toEqual([expect.stringMatching(/^import\/no-restricted-paths: .*lib\/ must not import components/)]);
  });

  it('lets components use lib/ and shared/', () => {
    const messages = lintAs(
      'components/ui/probe.tsx',
      "import { analyze } from '@/shared/analysis/analyze';\nimport * as format from '@/lib/format';\nexport const x = [analyze, format];\n",
    );
    expect(messages).toEqual([]);
  });

  it('finds an import cycle', () => {
    const [result] = eslint(['--no-ignore', 'tests/lint/fixtures/cycle-a.ts']);
    expect(result.messages.map((m) => m.ruleId)).toEqual(['import/no-cycle']);
  });

  it('keeps the fixtures out of the project run', () => {
    const [result] = eslint(['tests/lint/fixtures/cycle-a.ts']);
    // ESLint reports an ignored file with a single warning instead of linting it.
    expect(result.messages).toEqual([expect.objectContaining({ ruleId: null, message: expect.stringMatching(/ignored/) })]);
  });
});
