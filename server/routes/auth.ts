import { Router } from 'express';
import { signInBody } from '@/shared/api/auth';
import { reply } from '@/server/http/reply';
import { endSession, startSession } from '@/server/http/session';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { signInLimiter } from '@/server/middleware/rate-limit';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/** /api/auth: sign in (public, rate limited), sign out (idempotent), who am I. */
export function authRoutes({ auth }: Services): Router {
  const router = Router();
  const signIn = validate({ body: signInBody });

  router.post('/sign-in', ...signInLimiter(), signIn, async (req, res) => {
    const result = await auth.signIn(signIn.input(req).body);
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
