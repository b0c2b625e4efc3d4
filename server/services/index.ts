import { createAuthService } from './auth';
import { createBuildServices } from './build';
import type { ServiceDeps } from './deps';
import { createDesignServices } from './designs';
import { createInvitationService } from './invitations';
import { createPhotoStore } from './photos/store';
import { createTeamService } from './team';

/** All services of one app instance. */
export function createServices(deps: ServiceDeps) {
  return {
    auth: createAuthService(deps),
    team: createTeamService(deps),
    invitations: createInvitationService(deps),
    ...createDesignServices({ ...deps, appUrl: deps.config.appUrl, now: () => new Date() }),
    ...createBuildServices({ ...deps, appUrl: deps.config.appUrl, now: () => new Date(), photos: createPhotoStore(deps.config.photosDir) }),
  };
}

export type Services = ReturnType<typeof createServices>;
