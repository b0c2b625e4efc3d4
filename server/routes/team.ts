import { Router } from 'express';
import { idParams, invitationBody, memberPatchBody } from '@/shared/api/team';
import { reply } from '@/server/http/reply';
import { currentUser, requireCapability, requireUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/** /api/team: every member reads the team; only roles with `manageTeam` change it. */
export function teamRoutes({ team, invitations }: Services): Router {
  const router = Router();
  const manage = requireCapability('manageTeam');
  const byId = validate({ params: idParams });
  const newInvitation = validate({ body: invitationBody });
  const rolePatch = validate({ body: memberPatchBody, params: idParams });

  router.get('/', requireUser, async (req, res) => {
    reply(res, await team.getTeam(currentUser(req)), 200, (body) => body);
  });

  router.post('/invitations', manage, newInvitation, async (req, res) => {
    const { body } = newInvitation.input(req);
    reply(res, await invitations.invite(currentUser(req), body), 201, (invitation) => ({ invitation }));
  });

  router.delete('/invitations/:id', manage, byId, async (req, res) => {
    reply(res, await invitations.revoke(currentUser(req), byId.input(req).params.id), 204);
  });

  router.patch('/members/:id', manage, rolePatch, async (req, res) => {
    const { body, params } = rolePatch.input(req);
    reply(res, await team.changeRole(currentUser(req), params.id, body.role), 200, (member) => ({ member }));
  });

  router.delete('/members/:id', manage, byId, async (req, res) => {
    reply(res, await team.removeMember(currentUser(req), byId.input(req).params.id), 204);
  });

  return router;
}
