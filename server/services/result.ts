import type { Issue } from '@/shared/api/common';

/** What can go wrong in a service, independent of HTTP; routes map each kind to a status (server/http/reply.ts). */
export type FailureKind =
  | 'invalid'
  | 'not-found'
  | 'conflict'
  | 'forbidden'
  | 'unauthorized'
  | 'unavailable'
  /** Well-formed, but past what the server will work on (the analysis' time or memory limit). */
  | 'unprocessable'
  /** Too many attempts of one kind; `details.retryAfterSeconds` says when to try again. */
  | 'too-many'
  /** The server cannot take more of this work right now (its queues are full). */
  | 'busy'
  /** An upload whose content is not a type the route takes. */
  | 'unsupported-type';

/**
 * `issues` point at the request's fields (for `invalid`); `details` are extra fields of the error body,
 * such as a save conflict's `latestVersion` (docs/api.md).
 */
export type Failure = { ok: false; kind: FailureKind; message: string; issues?: Issue[]; details?: Record<string, unknown> };
export type Result<T> = { ok: true; value: T } | Failure;

export const ok = <T>(value: T): Result<T> => ({ ok: true, value });
export const fail = (kind: FailureKind, message: string, extra: Pick<Failure, 'issues' | 'details'> = {}): Failure => ({
  ok: false,
  kind,
  message,
  ...extra,
});
/** A 400 listing every problem, with its field path, in the same shape as the validate() middleware's. */
export const invalid = (issues: Issue[]): Failure =>
  fail('invalid', issues.length === 1 ? describeIssue(issues[0]) : `The request has ${issues.length} problems; see issues.`, { issues });

function describeIssue(issue: Issue): string {
  return issue.path ? `${issue.path}: ${issue.message}` : issue.message;
}
