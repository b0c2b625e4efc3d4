import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError } from 'sequelize';

export const BODY_LIMIT_BYTES = 10 * 1024 * 1024;

/** Unknown /api paths answer JSON, never the web app's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: `There is no API route ${req.method} ${req.baseUrl}${req.path}.` });
};

/** body-parser's error types, in our words (https://github.com/expressjs/body-parser#errors). */
const BODY_ERRORS: Record<string, [number, string]> = {
  'entity.too.large': [413, 'The request body is larger than 10 MB.'],
  'entity.parse.failed': [400, 'The request body is not valid JSON.'],
  'encoding.unsupported': [415, 'The request body uses an encoding the server does not accept.'],
  'charset.unsupported': [415, 'The request body uses a character set the server does not accept.'],
  'request.aborted': [400, 'The request was aborted before its body arrived.'],
  'request.size.invalid': [400, 'The request body is shorter or longer than its Content-Length.'],
  'parameters.too.many': [413, 'The request has too many parameters.'],
};

/**
 * The last handler: known errors become their status with a sentence; anything else is a 500 with a
 * generic sentence. Stacks and internal messages go to the server log only, never to the client.
 */
export const errorHandler: ErrorRequestHandler = (error: unknown, req, res, next) => {
  if (res.headersSent) return next(error);
  const type = (error as { type?: unknown })?.type;
  const known = typeof type === 'string' ? BODY_ERRORS[type] : undefined;
  if (known) {
    res.status(known[0]).json({ error: known[1] });
    return;
  }
  if (error instanceof UniqueConstraintError) {
    res.status(409).json({ error: 'This conflicts with something that already exists.' });
    return;
  }
  const status = (error as { status?: unknown; expose?: unknown })?.status;
  if (typeof status === 'number' && status >= 400 && status < 500 && (error as { expose?: unknown }).expose === true) {
    res.status(status).json({ error: 'The request could not be handled.' });
    return;
  }
  console.error(`${req.method} ${req.originalUrl} failed:`, error);
  res.status(500).json({ error: 'Something went wrong on our side. Try again; if it keeps happening, tell your admin.' });
};
