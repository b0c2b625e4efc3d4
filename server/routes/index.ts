import { Router } from 'express';
import type { Config } from '@/server/config';
import type { Mailbox } from '@/server/mail/mailbox';
import { apiNotFound } from '@/server/middleware/errors';
import type { Services } from '@/server/services';
import { authRoutes } from './auth';
import { buildRoutes } from './build';
import { buildSheetRoutes } from './build-sheet';
import { designRoutes } from './designs';
import { devMailRoutes } from './dev-mail';
import { invitationRoutes } from './invitations';
import { photoRoutes } from './photos';
import { secretRoutes } from './secrets';
import { teamRoutes } from './team';
import { versionRoutes } from './versions';

/**
 * Everything under /api. Each route names its own guard (requireUser / requireCapability) next to its
 * path; the only routes without one are sign-in, sign-out and the invitation-token routes.
 */
export function apiRoutes(services: Services, mailbox: Mailbox | null, config: Config): Router {
  const api = Router();
  api.use('/auth', authRoutes(services, config));
  api.use('/team', teamRoutes(services));
  api.use('/invitations', invitationRoutes(services, config));
  api.use('/designs', designRoutes(services), versionRoutes(services), buildSheetRoutes(services), buildRoutes(services), secretRoutes(services));
  api.use('/photos', photoRoutes(services));
  api.use('/dev/mail', devMailRoutes(mailbox));
  api.use(apiNotFound);
  return api;
}
