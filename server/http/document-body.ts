import express, { type RequestHandler } from 'express';
import { BODY_LIMIT_BYTES } from '@/server/middleware/errors';

/** POST /api/designs/:id/versions, relative to the API router. */
const SAVE_PATH = /^\/designs\/[^/]+\/versions\/?$/;

const asText = express.text({ type: ['application/json', 'application/*+json'], limit: BODY_LIMIT_BYTES });

/**
 * A version save's body is kept as the text that came over the wire: express.json would parse a
 * document of many megabytes on the request thread, and the analysis process parses it anyway
 * (`prepareSave` in server/analysis/tasks.ts). Once this has read the body, express.json sees the
 * request finished and leaves it alone. The limit and its 413 are express.json's.
 */
export function saveBodiesAsText(): RequestHandler {
  return (req, res, next) => {
    if (req.method !== 'POST' || !SAVE_PATH.test(req.path)) return next();
    asText(req, res, next);
  };
}
