import { analyze } from '@/shared/analysis/analyze';
import type { Issue } from '@/shared/api/common';
import { parseCliArgs } from '@/shared/cli/args';
import { failedIdIssues } from '@/shared/cli/failed-ids';
import { validateTopology } from '@/shared/topology/validate';

/**
 * `npm run analyze -- a.json [b.json …] [--failed=unit,unit] [--after-one]`. One file prints its report as
 * indented JSON; several print one compact report per line (JSON Lines) in the order given. A file
 * that is not a valid document — or that lacks a failure unit named by `--failed` — gets
 * `{"file", "errors"}` in its place on stdout and a sentence on stderr, and the command exits 2
 * after the last file; 0 when every file was valid. Arguments: args.ts.
 * The file system is passed in so tests can run the whole command without touching disk.
 */
export type CliIo = {
  readFile: (path: string) => string;
  out: (line: string) => void;
  err: (line: string) => void;
};

export const USAGE = [
  'usage: npm run analyze -- design.json [more.json …] [--failed unit-id[,unit-id…]]… [--after-one]',
  '  --failed=a,b or --failed a,b fails those units before the analysis; give it as often as you like, the ids add up.',
  '  Each id must be a failure unit (a cable, card, switch, controller, PSU or power feed) of every file; an id holding a comma cannot be named.',
  '  --after-one adds afterOneFailure: for each unit not owned by one host, the pairs it cuts off and those it leaves exposed.',
  '  -- ends the options. Exit 0 when every file was analysed, 2 otherwise.',
].join('\n');

/** Why a file could not be read, as a person says it. */
const READ_ERRORS = new Map<string, string>([
  ['ENOENT', 'there is no such file'],
  ['EISDIR', 'it is a folder'],
  ['EACCES', 'permission was denied'],
  ['EPERM', 'permission was denied'],
]);

type Loaded = { doc: unknown } | { errors: Issue[]; sentence: string };

function load(io: CliIo, file: string): Loaded {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'error';
    const why = READ_ERRORS.get(code) ?? code;
    return { errors: [{ path: '', message: `The file could not be read (${why}).` }], sentence: `${file} could not be read: ${why}.` };
  }
  try {
    // A byte-order mark is how some editors begin a UTF-8 file; it is not part of the JSON.
    return { doc: JSON.parse(text.replace(/^\uFEFF/, '')) as unknown };
  } catch (error) {
    const why = (error as Error).message;
    return { errors: [{ path: '', message: `The file is not JSON (${why}).` }], sentence: `${file} is not JSON: ${why}.` };
  }
}

function invalidSentence(file: string, issues: Issue[]): string {
  const first = issues[0];
  const count = issues.length;
  const where = first.path ? ` at ${first.path}` : '';
  return `${file} is not a valid topology document (${count} problem${count === 1 ? '' : 's'}); the first${where}: ${first.message}`;
}

function failedSentence(file: string, issues: Issue[]): string {
  return `${file} was not analysed: ${issues.map((issue) => issue.message).join(' ')}`;
}

export function runAnalyzeCli(args: readonly string[], io: CliIo): number {
  const parsed = parseCliArgs(args);
  if (!parsed.ok) {
    io.err(args.length === 0 ? USAGE : `${parsed.reason}\n${USAGE}`);
    return 2;
  }
  const { files, failed, afterOne } = parsed;
  let invalid = 0;
  const reject = (file: string, errors: Issue[], sentence: string) => {
    invalid += 1;
    io.out(JSON.stringify({ file, errors }));
    io.err(sentence);
  };
  for (const file of files) {
    const loaded = load(io, file);
    if (!('doc' in loaded)) {
      reject(file, loaded.errors, loaded.sentence);
      continue;
    }
    const checked = validateTopology(loaded.doc);
    if (!checked.ok) {
      reject(file, checked.issues, invalidSentence(file, checked.issues));
      continue;
    }
    const notUnits = failedIdIssues(checked.doc, failed);
    if (notUnits.length > 0) {
      reject(file, notUnits, failedSentence(file, notUnits));
      continue;
    }
    const report = analyze(checked.doc, { failed, afterOne });
    io.out(files.length === 1 ? JSON.stringify(report, null, 2) : JSON.stringify(report));
  }
  return invalid > 0 ? 2 : 0;
}
