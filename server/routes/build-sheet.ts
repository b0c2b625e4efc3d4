import { Router } from 'express';
import { versionParams } from '@/shared/api/designs';
import { replyFile } from '@/server/http/download';
import { reply } from '@/server/http/reply';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/designs/:id/versions/:n — the build sheet (docs/api.md): the cable schedule as JSON, `cables.csv`,
 * `addresses.csv`, the workbook `cables.xlsx` and the hosts' `login-plan`. Read access as for the version itself: every role,
 * installers approved versions only, another team 404.
 */
export function buildSheetRoutes({ buildSheet }: Services): Router {
  const router = Router();
  const read = requireCapability('readApprovedVersions');
  const one = validate({ params: versionParams });

  router.get('/:id/versions/:n/cables', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await buildSheet.cables(currentUser(req), id, n), 200, (schedule) => schedule);
  });

  router.get('/:id/versions/:n/cables.csv', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyFile(res, await buildSheet.cablesCsv(currentUser(req), id, n));
  });

  router.get('/:id/versions/:n/addresses.csv', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyFile(res, await buildSheet.addressesCsv(currentUser(req), id, n));
  });

  router.get('/:id/versions/:n/cables.xlsx', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyFile(res, await buildSheet.cablesXlsx(currentUser(req), id, n));
  });

  router.get('/:id/versions/:n/login-plan', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await buildSheet.loginPlan(currentUser(req), id, n), 200, (plan) => plan);
  });

  return router;
}
