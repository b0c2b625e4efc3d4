import { Router } from 'express';
import { createDesignBody, designIdParams, designListQuery } from '@/shared/api/designs';
import { reply } from '@/server/http/reply';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/designs: every role reads (installers get only designs with an approved version, and only
 * those versions); designers and admins create. Another team's design answers 404 like a missing one.
 */
export function designRoutes({ designs }: Services): Router {
  const router = Router();
  const read = requireCapability('readApprovedVersions');
  const listing = validate({ query: designListQuery });
  const creation = validate({ body: createDesignBody });
  const byId = validate({ params: designIdParams });

  router.get('/', read, listing, async (req, res) => {
    reply(res, await designs.list(currentUser(req), listing.input(req).query), 200, (page) => page);
  });

  router.post('/', requireCapability('editDesigns'), creation, async (req, res) => {
    reply(res, await designs.create(currentUser(req), creation.input(req).body), 201, (created) => created);
  });

  router.get('/:id', read, byId, async (req, res) => {
    reply(res, await designs.get(currentUser(req), byId.input(req).params.id), 200, (design) => design);
  });

  return router;
}
