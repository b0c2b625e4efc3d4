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
  // An upload whose content is not a type the route takes (RFC 9110 §15.5.16 415 Unsupported Media Type).
  'unsupported-type': 415,
};

/** Send a service result: `status` with `shape(value)` on success (no body for 204), the mapped error otherwise. */
export function reply<T>(res: Response, result: Result<T>, status: number, shape?: (value: T) => unknown): void {
  if (!result.ok) {
    res.status(STATUS[result.kind]).json({ error: result.message, ...result.details, ...(result.issues ? { issues: result.issues } : {}) });
    return;
  }
  if (status === 204 || !shape) {
    res.status(status).end();
    return;
  }
  res.status(status).json(shape(result.value));
}
