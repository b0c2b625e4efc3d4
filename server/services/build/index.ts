import type { User } from '@/shared/api/auth';
import type { BuildRecord, HistoryEntry } from '@/shared/api/build';
import { createPhotoService } from '@/server/services/photos';
import type { PhotoStore } from '@/server/services/photos/store';
import type { DesignDeps } from '@/server/services/designs/deps';
import { ok, type Result } from '@/server/services/result';
import type { BuildDeps } from './deps';
import { readHistory } from './history';
import { createMarkService } from './marks';
import { openBuild } from './open';
import { readRecord } from './record';
import { createVersionCache } from './version-cache';

/**
 * Site work on a version (api.md): read its build record and history (every role that may read the
 * version), mark cables and bring-up steps, attach and read photos (marks.ts, photos/).
 */
export function createBuildServices(input: DesignDeps & { photos: PhotoStore }) {
  const deps: BuildDeps = { ...input, versions: createVersionCache() };
  const { models, sequelize } = deps;
  return {
    build: {
      async record(viewer: User, id: number, n: number): Promise<Result<BuildRecord>> {
        const opened = await openBuild(deps, viewer, id, n);
        if (!opened.ok) return opened;
        return ok(await readRecord({ models, sequelize, versions: deps.versions }, opened.value));
      },

      async history(viewer: User, id: number, n: number): Promise<Result<HistoryEntry[]>> {
        const opened = await openBuild(deps, viewer, id, n);
        if (!opened.ok) return opened;
        return ok(await readHistory(models, opened.value.record.row.id));
      },

      ...createMarkService(deps),
    },
    photos: createPhotoService(deps),
  };
}

export type BuildServices = ReturnType<typeof createBuildServices>;
