import type { RequestHandler } from 'express';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
export const CROSS_SITE = 'Requests from other sites are not accepted.';

/**
 * Refuse state-changing requests sent from another site (cross-site request forgery). Browsers send
 * `Origin` on such requests (RFC 6454 §7; Fetch standard) and `Sec-Fetch-Site` (W3C Fetch Metadata).
 * Accepted: no Origin (non-browser clients) and `trustedOrigins` — APP_URL's origin, TRUSTED_ORIGINS,
 * and the Expo dev server outside production. The request's own Host header is never the yardstick:
 * whoever sends the request chooses it, so a forged Host with a matching Origin would pass.
 */
export function refuseCrossSite(trustedOrigins: readonly string[]): RequestHandler {
  const trusted = new Set(trustedOrigins);
  return (req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (req.get('sec-fetch-site') === 'cross-site') return refuse(res);
    const origin = req.get('origin');
    if (origin === undefined || trusted.has(origin)) return next();
    return refuse(res);
  };
}

function refuse(res: Parameters<RequestHandler>[1]): void {
  res.status(403).json({ error: CROSS_SITE });
}
