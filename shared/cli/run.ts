import { analyze } from '@/shared/analysis/analyze';
import type { Issue } from '@/shared/api/common';
import { validateTopology } from '@/shared/topology/validate';

/**
 * `npm run analyze -- a.json [b.json …] [--failed=unit,unit]`. One file prints its report as
 * indented JSON; several print one compact report per line (JSON Lines) in the order given. A file
 * that is not a valid document gets `{"file", "errors"}` in its place on stdout and a sentence on
 * stderr, and the command exits 2 after the last file; 0 when every file was valid.
 * The file system is passed in so tests can run the whole command without touching disk.
 */
export type CliIo = {
  readFile: (path: string) => string;
  out: (line: string) => void;
  err: (line: string) => void;
};

export const USAGE = 'usage: npm run analyze -- design.json [more.json …] [--failed=unit-id,unit-id]';

/** Why a file could not be read, as a person says it. */
const READ_ERRORS: Record<string, string> = {
  ENOENT: 'there is no such file',
  EISDIR: 'it is a folder',
  EACCES: 'permission was denied',
  EPERM: 'permission was denied',
};

type Loaded = { doc: unknown } | { errors: Issue[]; sentence: string };

function load(io: CliIo, file: string): Loaded {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'error';
    const why = READ_ERRORS[code] ?? code;
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

export function runAnalyzeCli(args: readonly string[], io: CliIo): number {
  const failedArg = args.find((a) => a.startsWith('--failed='));
  const failed = failedArg ? failedArg.slice('--failed='.length).split(',').filter(Boolean) : [];
  const files = args.filter((a) => !a.startsWith('--'));
  if (files.length === 0 || args.some((a) => a.startsWith('--') && !a.startsWith('--failed='))) {
    io.err(USAGE);
    return 2;
  }
  let invalid = 0;
  for (const file of files) {
    const loaded = load(io, file);
    if (!('doc' in loaded)) {
      invalid += 1;
      io.out(JSON.stringify({ file, errors: loaded.errors }));
      io.err(loaded.sentence);
      continue;
    }
    const checked = validateTopology(loaded.doc);
    if (!checked.ok) {
      invalid += 1;
      io.out(JSON.stringify({ file, errors: checked.issues }));
      io.err(invalidSentence(file, checked.issues));
      continue;
    }
    const report = analyze(checked.doc, { failed });
    io.out(files.length === 1 ? JSON.stringify(report, null, 2) : JSON.stringify(report));
  }
  return invalid > 0 ? 2 : 0;
}
