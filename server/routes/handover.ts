import { Router } from 'express';
import { versionParams } from '@/shared/api/designs';
import { replyFile } from '@/server/http/download';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/** /api/designs/:id/versions/:n/handover.pdf — the handover pack (api.md), read as the version is. */
export function handoverRoutes({ handover }: Services): Router {
  const router = Router();
  const read = requireCapability('readApprovedVersions');
  const one = validate({ params: versionParams });

  router.get('/:id/versions/:n/handover.pdf', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyFile(res, await handover.handoverPdf(currentUser(req), id, n));
  });

  return router;
}
