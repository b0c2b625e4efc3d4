import type { Request, Response } from 'express';

/**
 * Answers about immutable things (a version, its stored report): a strong ETag and `private,
 * no-cache`, so the browser keeps the answer and asks each time whether it may still use it
 * (RFC 9111 §5.2.2.4); the question is answered 304 Not Modified when its If-None-Match names the
 * tag (RFC 9110 §13.1.2, §15.4.5), before the document or report is read. `private`: the answer is
 * one person's (their team, their role), never for a shared cache.
 */
export function answeredNotModified(req: Request, res: Response, etag: string | null): boolean {
  if (etag === null) return false;
  res.setHeader('ETag', etag);
  res.setHeader('Cache-Control', 'private, no-cache');
  // Express's req.fresh compares If-None-Match with the ETag just set (GET and HEAD only).
  if (!req.fresh) return false;
  res.status(304).end();
  return true;
}
