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

function load(io: CliIo, file: string): { doc: unknown } | { errors: Issue[] } {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    return { errors: [{ path: '', message: `The file could not be read (${(error as NodeJS.ErrnoException).code ?? 'error'}).` }] };
  }
  try {
    return { doc: JSON.parse(text) as unknown };
  } catch (error) {
    return { errors: [{ path: '', message: `The file is not JSON (${(error as Error).message}).` }] };
  }
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
    const checked = 'doc' in loaded ? validateTopology(loaded.doc) : ({ ok: false, issues: loaded.errors } as const);
    if (!checked.ok) {
      invalid += 1;
      io.out(JSON.stringify({ file, errors: checked.issues }));
      const first = checked.issues[0];
      const count = checked.issues.length;
      io.err(`${file} is not a valid topology document: ${count} problem${count === 1 ? '' : 's'}, first ${first.path ? `at ${first.path}: ` : ''}${first.message}`);
      continue;
    }
    const report = analyze(checked.doc, { failed });
    io.out(files.length === 1 ? JSON.stringify(report, null, 2) : JSON.stringify(report));
  }
  return invalid > 0 ? 2 : 0;
}
