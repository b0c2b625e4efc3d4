import { poolAnalysis } from './analysis';
import { createAuthService } from './auth';
import { createSignInThrottle } from './sign-in-throttle';
import type { ServiceDeps } from './deps';
import { createDesignServices } from './designs';
import { createInvitationService } from './invitations';
import { createTeamService } from './team';

/** All services of one app instance. */
export function createServices(deps: ServiceDeps) {
  return {
    auth: createAuthService({ ...deps, throttle: createSignInThrottle(deps.clock) }),
    team: createTeamService(deps),
    invitations: createInvitationService(deps),
    ...createDesignServices({ ...deps, appUrl: deps.config.appUrl, now: () => new Date(), analysis: poolAnalysis(deps.config.analysis) }),
  };
}

export type Services = ReturnType<typeof createServices>;
