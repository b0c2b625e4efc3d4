import { Router } from 'express';
import { photoParams } from '@/shared/api/build';
import { reply } from '@/server/http/reply';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/photos/:id — a build photo, for its design's team only (installers: approved versions);
 * anyone else gets 404. Served as the type its content was judged to be, with `nosniff`, and kept
 * in the browser's private cache only: a stored photo never changes.
 */
export const PHOTO_CACHE = 'private, max-age=86400, immutable';

export function photoRoutes({ photos }: Services): Router {
  const router = Router();
  const byId = validate({ params: photoParams });

  router.get('/:id', requireCapability('readApprovedVersions'), byId, async (req, res) => {
    const result = await photos.read(currentUser(req), byId.input(req).params.id);
    if (!result.ok) return reply(res, result, 200);
    const { contentType, body, id } = result.value;
    res
      .status(200)
      .type(contentType)
      .setHeader('X-Content-Type-Options', 'nosniff')
      .setHeader('Cache-Control', PHOTO_CACHE)
      .setHeader('Content-Disposition', `inline; filename="photo-${id}.${contentType.slice('image/'.length).replace('jpeg', 'jpg')}"`)
      .send(body);
  });

  return router;
}
