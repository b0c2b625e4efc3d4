import type { RequestHandler } from 'express';
import type { Config } from '@/server/config';

/**
 * In production the session cookie is Secure (RFC 6265 §4.1.2.5): a browser keeps it only from an
 * HTTPS answer, and express-session does not even send it when the request did not arrive over
 * HTTPS. Rather than answer a sign-in with 200 and no cookie (signed in, and then not), the routes
 * that start a session refuse such a request and say why. "Over HTTPS" means TLS to this process or
 * X-Forwarded-Proto: https from a proxy that TRUST_PROXY names.
 */
export function requireHttps(config: Pick<Config, 'isProduction' | 'appUrl'>): RequestHandler {
  let warned = false;
  return (req, res, next) => {
    if (!config.isProduction || req.secure) return next();
    if (!warned) {
      warned = true;
      console.warn(
        'A sign-in arrived over plain HTTP in production. If a TLS proxy is in front, list its address in TRUST_PROXY ' +
          'so its X-Forwarded-Proto is believed; otherwise open the app at its https:// address.',
      );
    }
    res.status(403).json({
      error: `Signing in needs HTTPS, and this request came over plain HTTP, so no session could be kept. Open ${config.appUrl} instead.`,
    });
  };
}
