/** What can go wrong in a service, independent of HTTP; routes map each kind to a status (server/http/reply.ts). */
export type FailureKind = 'not-found' | 'conflict' | 'forbidden' | 'unauthorized' | 'unavailable';

export type Failure = { ok: false; kind: FailureKind; message: string };
export type Result<T> = { ok: true; value: T } | Failure;

export const ok = <T>(value: T): Result<T> => ({ ok: true, value });
export const fail = (kind: FailureKind, message: string): Failure => ({ ok: false, kind, message });
