/**
 * The analyze command's arguments: file names, and `--failed` ids for a what-if run. `--failed`
 * may be given any number of times, as `--failed=a,b` or `--failed a,b`; the ids of every
 * occurrence add up (a repeated id counts once). Ids are separated by commas, so an id that holds a
 * comma cannot be named here. `--` ends the options: what follows is a file name even when it
 * begins with `--`. `--after-one` adds `afterOneFailure` to each report (docs/api.md).
 */
export type CliArgs = { ok: true; files: string[]; failed: string[]; afterOne: boolean } | { ok: false; reason: string };

function ids(value: string): string[] {
  return value.split(',').filter((id) => id !== '');
}

export function parseCliArgs(args: readonly string[]): CliArgs {
  const files: string[] = [];
  const failed = new Set<string>();
  let options = true;
  let afterOne = false;
  for (let i = 0; i < args.length; i += 1) {
    const arg = args[i];
    if (!options || !arg.startsWith('--')) {
      files.push(arg);
    } else if (arg === '--after-one') {
      afterOne = true;
    } else if (arg === '--') {
      options = false;
    } else if (arg.startsWith('--failed=')) {
      for (const id of ids(arg.slice('--failed='.length))) failed.add(id);
    } else if (arg === '--failed') {
      const value = args[i + 1];
      if (value === undefined || value.startsWith('--')) return { ok: false, reason: '--failed needs the ids of the units to fail.' };
      for (const id of ids(value)) failed.add(id);
      i += 1;
    } else {
      return { ok: false, reason: `${JSON.stringify(arg)} is not an option of this command.` };
    }
  }
  if (files.length === 0) return { ok: false, reason: 'Name at least one document file.' };
  return { ok: true, files, failed: [...failed], afterOne };
}
