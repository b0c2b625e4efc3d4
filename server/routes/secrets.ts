import { Router } from 'express';
import { designIdParams } from '@/shared/api/designs';
import { generateSecretsBody, revealQuery } from '@/shared/api/secrets';
import { reply } from '@/server/http/reply';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/designs/:id/secrets — CHAP secrets (api.md). The role checks live in the service, after the
 * team check, so another team gets 404 whatever its role; designers and reviewers get 403 on the
 * reveal, reviewers and installers on generating. Answers holding secrets are never cached.
 */
export function secretRoutes({ secrets }: Services): Router {
  const router = Router();
  const generating = validate({ body: generateSecretsBody, params: designIdParams });
  const revealing = validate({ params: designIdParams, query: revealQuery });
  const one = validate({ params: designIdParams });

  router.post('/:id/secrets', requireUser, generating, async (req, res) => {
    const { body, params } = generating.input(req);
    reply(res, await secrets.generate(currentUser(req), params.id, body), 201, (made) => made);
  });

  router.get('/:id/secrets', requireUser, revealing, async (req, res) => {
    const { params, query } = revealing.input(req);
    res.setHeader('Cache-Control', 'no-store');
    reply(res, await secrets.reveal(currentUser(req), params.id, query.host), 200, (shown) => shown);
  });

  router.get('/:id/secrets/status', requireUser, one, async (req, res) => {
    reply(res, await secrets.status(currentUser(req), one.input(req).params.id), 200, (status) => ({ status }));
  });

  return router;
}
