import { Router } from 'express';
import { designIdParams, diffQuery, restoreBody, reviewBody, saveVersionBody, versionParams } from '@/shared/api/designs';
import { reply, replyJsonText } from '@/server/http/reply';
import { currentUser, requireAnyCapability, requireCapability } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { Services } from '@/server/services';

/**
 * /api/designs/:id/versions…: read a version, its report and a diff (every role; installers approved
 * versions only), save and restore (designers, admins), review steps (the service checks the role the
 * action needs: submit for designers and admins, approve and request-changes for reviewers and admins).
 */
export function versionRoutes({ versions, reviews }: Services): Router {
  const router = Router();
  const read = requireCapability('readApprovedVersions');
  const edit = requireCapability('editDesigns');
  const saving = validate({ body: saveVersionBody, params: designIdParams });
  const one = validate({ params: versionParams });
  const diffing = validate({ params: versionParams, query: diffQuery });
  const restoring = validate({ body: restoreBody, params: versionParams });
  const reviewing = validate({ body: reviewBody, params: versionParams });

  router.post('/:id/versions', edit, saving, async (req, res) => {
    const { body, params } = saving.input(req);
    reply(res, await versions.save(currentUser(req), params.id, body), 201, (version) => ({ version }));
  });

  router.get('/:id/versions/:n', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    reply(res, await versions.get(currentUser(req), id, n), 200, (version) => ({ version }));
  });

  router.get('/:id/versions/:n/report', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyJsonText(res, await versions.report(currentUser(req), id, n), 200, (stored) => ({ report: stored.reportJson, summary: JSON.stringify(stored.summary) }));
  });

  // For every unit not owned by one host: the pairs it cuts off and those it leaves exposed (api.md `--after-one`).
  router.get('/:id/versions/:n/after-one', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyJsonText(res, await versions.afterOne(currentUser(req), id, n), 200, (stored) => ({ afterOneFailure: stored.afterOneJson }));
  });

  // The diff reads "from version `against` to version `n`": what changed going from the first to the second.
  router.get('/:id/versions/:n/diff', read, diffing, async (req, res) => {
    const { params, query } = diffing.input(req);
    reply(res, await versions.diff(currentUser(req), params.id, params.n, query.against), 200, (diff) => ({ diff }));
  });

  router.post('/:id/versions/:n/restore', edit, restoring, async (req, res) => {
    const { body, params } = restoring.input(req);
    reply(res, await versions.restore(currentUser(req), params.id, params.n, body), 201, (version) => ({ version }));
  });

  router.post('/:id/versions/:n/review', requireAnyCapability('editDesigns', 'review'), reviewing, async (req, res) => {
    const { body, params } = reviewing.input(req);
    reply(res, await reviews.act(currentUser(req), params.id, params.n, body), 200, (result) => result);
  });

  return router;
}
