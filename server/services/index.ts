import { createAuthService } from './auth';
import type { ServiceDeps } from './deps';
import { createInvitationService } from './invitations';
import { createTeamService } from './team';

/** All services of one app instance. Later areas (designs, versions, reviews) add theirs here. */
export function createServices(deps: ServiceDeps) {
  return {
    auth: createAuthService(deps),
    team: createTeamService(deps),
    invitations: createInvitationService(deps),
  };
}

export type Services = ReturnType<typeof createServices>;
