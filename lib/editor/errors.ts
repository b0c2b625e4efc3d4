/**
 * Why a command refused to run. Commands throw it instead of returning a broken document, so the
 * store can leave the working copy untouched and the canvas can show `message` as it is.
 */
export type CommandErrorCode =
  | 'bad-args'
  | 'unknown-command'
  | 'not-found'
  | 'wrong-kind'
  | 'refused'
  | 'read-only';

export class CommandError extends Error {
  readonly code: CommandErrorCode;
  /** Field path of the argument at fault, when there is one (`args.lengthM`). */
  readonly path?: string;

  constructor(code: CommandErrorCode, message: string, path?: string) {
    super(message);
    this.name = 'CommandError';
    this.code = code;
    this.path = path;
  }
}

export function isCommandError(error: unknown): error is CommandError {
  return error instanceof CommandError;
}

/** A zod failure as the first problem's plain sentence and field path. */
export function commandErrorFromZod(issues: readonly { path: PropertyKey[]; message: string }[], prefix = 'args'): CommandError {
  const first = issues[0];
  const path = [prefix, ...(first?.path ?? []).map(String)].join('.');
  return new CommandError('bad-args', `${path}: ${first?.message ?? 'is not valid'}`, path);
}
