import { rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';

const WINDOW_MS = 15 * 60 * 1000;
const FAILED_ATTEMPTS = 5;

/**
 * Five failed sign-ins per 15 minutes per address; successful ones do not count. Each app instance has its
 * own in-memory counter (one server process; a multi-process deployment would need a shared store).
 */
export function signInLimiter(): RateLimitRequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: FAILED_ATTEMPTS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (req, res) => {
      const reset = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const minutes = reset ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 60000)) : 15;
      res.status(429).json({
        error: `Too many sign-in attempts. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`,
      });
    },
  });
}
