import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

const WINDOW_MS = 15 * 60 * 1000;
/** Failed sign-ins allowed per account and address in one window. */
const FAILED_PER_ACCOUNT = 5;
/** Failed sign-ins allowed per address across all accounts (guessing one password on many accounts). */
const FAILED_PER_ADDRESS = 30;

function tooMany(req: Request, res: Parameters<RequestHandler>[1]) {
  const reset = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
  const minutes = reset ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 60000)) : 15;
  res.status(429).json({
    error: `Too many sign-in attempts. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`,
  });
}

function accountOf(req: Request): string {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 200) : '';
}

/**
 * Failed sign-ins are limited per account and address (five per 15 minutes), so a whole office behind
 * one address can still sign in at once, and per address across accounts (thirty), so one address
 * cannot try a password on every account. Successful sign-ins do not count. Counters are in memory
 * per app instance (one server process; several processes would need a shared store).
 */
export function signInLimiter(): RequestHandler[] {
  const common = {
    windowMs: WINDOW_MS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    handler: tooMany,
  };
  const address = (req: Request) => ipKeyGenerator(req.ip ?? '');
  return [
    rateLimit({ ...common, limit: FAILED_PER_ADDRESS, keyGenerator: address }),
    rateLimit({ ...common, limit: FAILED_PER_ACCOUNT, keyGenerator: (req) => `${address(req)}|${accountOf(req)}` }),
  ];
}
