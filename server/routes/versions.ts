import { Router } from 'express';
import { designIdParams, diffQuery, restoreBody, reviewBody, versionParams } from '@/shared/api/designs';
import { answeredNotModified } from '@/server/http/cache';
import { reply, replyJsonText, replyRawJson } from '@/server/http/reply';
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
  const saving = validate({ params: designIdParams });
  const one = validate({ params: versionParams });
  const diffing = validate({ params: versionParams, query: diffQuery });
  const restoring = validate({ body: restoreBody, params: versionParams });
  const reviewing = validate({ body: reviewBody, params: versionParams });

  // The body arrives as text (server/http/document-body.ts) and is parsed and checked against
  // saveVersionBody in the analysis process, with the document: the request thread never parses it.
  router.post('/:id/versions', edit, saving, async (req, res) => {
    const { params } = saving.input(req);
    const bodyText = typeof req.body === 'string' ? req.body : '';
    reply(res, await versions.saveBody(currentUser(req), params.id, bodyText), 201, (version) => ({ version }));
  });

  router.get('/:id/versions/:n', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    const opened = await versions.open(currentUser(req), id, n);
    if (!opened.ok) return reply(res, opened, 200);
    if (answeredNotModified(req, res, versions.detailTag(opened.value))) return;
    replyJsonText(res, await versions.detailJson(opened.value), 200, (version) => ({ version }));
  });

  router.get('/:id/versions/:n/report', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    const opened = await versions.open(currentUser(req), id, n);
    if (!opened.ok) return reply(res, opened, 200);
    if (answeredNotModified(req, res, await versions.reportTag(opened.value))) return;
    replyJsonText(res, await versions.report(opened.value), 200, (stored) => ({ report: stored.reportJson, summary: JSON.stringify(stored.summary) }));
  });

  // The report screen's data in one answer: {design, version (with its document), report, summary}.
  router.get('/:id/versions/:n/report-page', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    const viewer = currentUser(req);
    const opened = await versions.open(viewer, id, n);
    if (!opened.ok) return reply(res, opened, 200);
    if (answeredNotModified(req, res, await versions.reportPageTag(opened.value, viewer))) return;
    replyRawJson(res, await versions.reportPage(opened.value, viewer), 200);
  });

  // For every unit not owned by one host: the pairs it cuts off and those it leaves exposed (docs/api.md `--after-one`).
  router.get('/:id/versions/:n/after-one', read, one, async (req, res) => {
    const { id, n } = one.input(req).params;
    replyJsonText(res, await versions.afterOne(currentUser(req), id, n), 200, (stored) => ({ afterOneFailure: stored.afterOneJson }));
  });

  // The diff reads "from version `against` to version `n`": what changed going from the first to the second.
  router.get('/:id/versions/:n/diff', read, diffing, async (req, res) => {
    const { params, query } = diffing.input(req);
    replyJsonText(res, await versions.diff(currentUser(req), params.id, params.n, query.against), 200, (diff) => ({ diff }));
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
