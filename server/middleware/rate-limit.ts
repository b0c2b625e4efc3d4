import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

/**
 * The client as the limits count it: its address (from the connection, or from X-Forwarded-For
 * when the connection comes from a proxy TRUST_PROXY names), with IPv6 addresses taken as their
 * /56, since one subscriber usually holds a whole block of them.
 */
export function clientKey(req: Request): string {
  return ipKeyGenerator(req.ip ?? '');
}

const INVITATION_WINDOW_MS = 10 * 60 * 1000;
/** Requests to the public invitation routes per address in one window: opening a link and accepting it takes two or three. */
const INVITATION_REQUESTS = 30;

/**
 * The public invitation routes (preview and accept), per address: enough for a person opening
 * their link a few times and fixing a too-short password, too few to try tokens or to hash
 * passwords by the thousand. In memory per process, like the sign-in limits.
 */
export function invitationLimiter(): RequestHandler {
  return rateLimit({
    windowMs: INVITATION_WINDOW_MS,
    limit: INVITATION_REQUESTS,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: clientKey,
    handler: (req, res) => {
      const reset = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const minutes = reset ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 60000)) : 10;
      res.status(429).json({ error: `Too many requests for invitation links from your address. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.` });
    },
  });
}
