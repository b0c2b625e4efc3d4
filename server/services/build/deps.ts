import type { DesignDeps } from '@/server/services/designs/deps';
import type { PhotoStore } from '@/server/services/photos/store';
import type { VersionCache } from './version-cache';

/** What the build record services need: the design services' deps, the photo folder and the per-version cache. */
export type BuildDeps = DesignDeps & { photos: PhotoStore; versions: VersionCache };
