import { Router } from 'express';
import { acceptInvitationBody, invitationTokenParams } from '@/shared/api/team';
import type { Config } from '@/server/config';
import { reply } from '@/server/http/reply';
import { startSession } from '@/server/http/session';
import { invitationLimiter } from '@/server/middleware/rate-limit';
import { requireHttps } from '@/server/middleware/secure';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/** /api/invitations/:token: public on purpose — the token in the e-mailed link is the credential; limited per address. */
export function invitationRoutes({ invitations }: Services, config: Config): Router {
  const router = Router();
  router.use(invitationLimiter());
  const byToken = validate({ params: invitationTokenParams });
  const acceptance = validate({ body: acceptInvitationBody, params: invitationTokenParams });

  router.get('/:token', byToken, async (req, res) => {
    reply(res, await invitations.preview(byToken.input(req).params.token), 200, (invitation) => ({ invitation }));
  });

  router.post('/:token/accept', requireHttps(config), acceptance, async (req, res) => {
    const { body, params } = acceptance.input(req);
    const result = await invitations.accept(params.token, body);
    if (result.ok) await startSession(req, result.value.id);
    reply(res, result, 201, (user) => ({ user }));
  });

  return router;
}
