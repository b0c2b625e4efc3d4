import { Router } from 'express';
import { signInBody } from '@/shared/api/auth';
import { reply } from '@/server/http/reply';
import { endSession, startSession } from '@/server/http/session';
import { currentUser, requireUser } from '@/server/middleware/auth';
import type { Config } from '@/server/config';
import { clientKey } from '@/server/middleware/rate-limit';
import { requireHttps } from '@/server/middleware/secure';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/** /api/auth: sign in (public, throttled per address and account: services/sign-in-throttle.ts), sign out (idempotent), who am I. */
export function authRoutes({ auth }: Services, config: Config): Router {
  const router = Router();
  const signIn = validate({ body: signInBody });

  router.post('/sign-in', requireHttps(config), signIn, async (req, res) => {
    const result = await auth.signIn(signIn.input(req).body, clientKey(req));
    if (result.ok) await startSession(req, result.value.id);
    reply(res, result, 200, (user) => ({ user }));
  });

  // Signing out twice, or with an expired session, is still "signed out": 204 either way.
  router.post('/sign-out', async (req, res) => {
    await endSession(req, res);
    res.status(204).end();
  });

  router.get('/me', requireUser, (req, res) => {
    res.json({ user: currentUser(req) });
  });

  return router;
}
