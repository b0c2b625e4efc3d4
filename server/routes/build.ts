import { Router } from 'express';
import { markBody, photoFields, stepBody } from '@/shared/api/build';
import { versionParams } from '@/shared/api/designs';
import { reply } from '@/server/http/reply';
import { photoUpload } from '@/server/http/upload';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/designs/:id/versions/:n/build… — the build record (docs/api.md). Reading: every role that may read
 * the version (installers approved versions only, another team 404). Marking and photos: installers
 * and admins (403 for the others), on approved versions only (installers 404 otherwise, as for
 * reading; admins 409). A repeated clientId answers 200 with the mark stored the first time.
 */
export function buildRoutes({ build, photos }: Services): Router {
  const router = Router();
  const read = requireCapability('readApprovedVersions');
  const mark = requireCapability('markBuild');
  const one = validate({ params: versionParams });
  const marking = validate({ body: markBody, params: versionParams });
  const stepping = validate({ body: stepBody, params: versionParams });
  const uploading = validate({ body: photoFields, params: versionParams });

  router.get('/:id/versions/:n/build', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await build.record(currentUser(req), id, n), 200, (record) => ({ build: record }));
  });

  router.get('/:id/versions/:n/build/checklist', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await build.checklist(currentUser(req), id, n), 200, (checklist) => ({ checklist }));
  });

  router.get('/:id/versions/:n/build/history', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await build.history(currentUser(req), id, n), 200, (marks) => ({ marks }));
  });

  router.post('/:id/versions/:n/build/marks', mark, marking, async (req, res) => {
    const { body, params } = marking.input(req);
    const result = await build.markCable(currentUser(req), params.id, params.n, body);
    reply(res, result, result.ok && !result.value.created ? 200 : 201, (written) => ({ mark: written.mark }));
  });

  router.post('/:id/versions/:n/build/steps', mark, stepping, async (req, res) => {
    const { body, params } = stepping.input(req);
    const result = await build.markStep(currentUser(req), params.id, params.n, body);
    reply(res, result, result.ok && !result.value.created ? 200 : 201, (written) => ({ mark: written.mark }));
  });

  router.post('/:id/versions/:n/build/photos', mark, photoUpload(), uploading, async (req, res) => {
    const { body, params } = uploading.input(req);
    reply(res, await photos.upload(currentUser(req), params.id, params.n, body, req.file), 201, (photo) => ({ photo }));
  });

  return router;
}
