import { createBuildSheetService } from '@/server/services/build-sheet';
import { createDesignService } from './designs';
import type { DesignDeps } from './deps';
import { createReviewService } from './reviews';
import { createVersionService } from './versions';

export type { DesignDeps, Within } from './deps';

/** The designs area: designs, their versions, and the review of versions. */
export function createDesignServices(deps: DesignDeps) {
  return {
    designs: createDesignService(deps),
    versions: createVersionService(deps),
    reviews: createReviewService(deps),
    buildSheet: createBuildSheetService(deps),
  };
}

export type DesignServices = ReturnType<typeof createDesignServices>;
