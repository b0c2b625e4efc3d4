import { readFileSync } from 'node:fs';
import { runAnalyzeCli } from '@/shared/cli/run';

/** Entry point of `npm run analyze`; see run.ts for what it prints and its exit codes. */
const code = runAnalyzeCli(process.argv.slice(2), {
  readFile: (path) => readFileSync(path, 'utf8'),
  out: (line) => process.stdout.write(`${line}\n`),
  err: (line) => process.stderr.write(`${line}\n`),
});
process.exitCode = code;
