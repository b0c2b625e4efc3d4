import { Router } from 'express';
import { apiNotFound } from '@/server/middleware/errors';
import { currentUser, requireCapability } from '@/server/middleware/auth';
import type { Mailbox } from '@/server/mail/mailbox';

/** /api/dev/mail: what the fake sink caught for the admin's team, newest first. Absent (404) unless MAIL=fake. */
export function devMailRoutes(mailbox: Mailbox | null): Router {
  const router = Router();
  if (!mailbox) {
    router.use(apiNotFound);
    return router;
  }
  router.get('/', requireCapability('manageTeam'), (req, res) => {
    res.json({ messages: mailbox.forTeam(currentUser(req).teamId) });
  });
  return router;
}
