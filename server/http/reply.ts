import type { Response } from 'express';
import type { FailureKind, Result } from '@/server/services/result';

const STATUS: Record<FailureKind, number> = {
  invalid: 400,
  'not-found': 404,
  conflict: 409,
  forbidden: 403,
  unauthorized: 401,
  // The mail relay or another service we depend on failed (RFC 9110 §15.6.3 502 Bad Gateway).
  unavailable: 502,
  // RFC 9110 §15.5.21 422 Unprocessable Content: understood, but the server will not finish it.
  unprocessable: 422,
  // RFC 6585 §4 429 Too Many Requests, with Retry-After (RFC 9110 §10.2.3).
  'too-many': 429,
  // RFC 9110 §15.6.4 503 Service Unavailable: a temporary overload.
  busy: 503,
  // An upload whose content is not a type the route takes (RFC 9110 §15.5.16 415 Unsupported Media Type).
  'unsupported-type': 415,
};

/** Send a service result: `status` with `shape(value)` on success (no body for 204), the mapped error otherwise. */
export function reply<T>(res: Response, result: Result<T>, status: number, shape?: (value: T) => unknown): void {
  if (!result.ok) {
    const retry = result.details?.retryAfterSeconds;
    if (typeof retry === 'number') res.setHeader('Retry-After', String(retry));
    res.status(STATUS[result.kind]).json({ error: result.message, ...result.details, ...(result.issues ? { issues: result.issues } : {}) });
    return;
  }
  if (status === 204 || !shape) {
    res.status(status).end();
    return;
  }
  res.status(status).json(shape(result.value));
}

/**
 * Send JSON that is already text (a stored report): no parse and stringify of a large body on the
 * request thread. `parts` are the top-level fields, each already serialised.
 */
export function replyJsonText<T>(res: Response, result: Result<T>, status: number, parts: (value: T) => Record<string, string>): void {
  if (!result.ok) return reply(res, result, status);
  const fields = Object.entries(parts(result.value)).map(([key, json]) => `${JSON.stringify(key)}:${json}`);
  res.status(status).type('application/json').send(`{${fields.join(',')}}`);
}

/** Send a success whose whole body is already JSON text. */
export function replyRawJson(res: Response, result: Result<string>, status: number): void {
  if (!result.ok) return reply(res, result, status);
  res.status(status).type('application/json').send(result.value);
}
