import { poolAnalysis } from './analysis';
import { createAuthService } from './auth';
import { createBuildServices } from './build';
import type { ServiceDeps } from './deps';
import { createDesignServices } from './designs';
import { createInvitationService } from './invitations';
import { createPhotoStore } from './photos/store';
import { createSecretsService } from './secrets';
import { createSignInThrottle } from './sign-in-throttle';
import { createTeamService } from './team';

/** All services of one app instance. */
export function createServices(deps: ServiceDeps) {
  const analysis = poolAnalysis(deps.config.analysis);
  return {
    auth: createAuthService({ ...deps, throttle: createSignInThrottle(deps.clock) }),
    team: createTeamService(deps),
    invitations: createInvitationService(deps),
    ...createDesignServices({ ...deps, appUrl: deps.config.appUrl, now: () => new Date(), analysis }),
    secrets: createSecretsService(deps),
    ...createBuildServices({ ...deps, appUrl: deps.config.appUrl, now: () => new Date(), analysis, photos: createPhotoStore(deps.config.photosDir) }),
  };
}

export type Services = ReturnType<typeof createServices>;
