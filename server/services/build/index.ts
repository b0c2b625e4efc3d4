import type { User } from '@/shared/api/auth';
import type { BuildRecord, HistoryEntry } from '@/shared/api/build';
import type { Step } from '@/shared/build';
import { createPhotoService } from '@/server/services/photos';
import type { PhotoStore } from '@/server/services/photos/store';
import type { DesignDeps } from '@/server/services/designs/deps';
import { ok, type Result } from '@/server/services/result';
import type { BuildDeps } from './deps';
import { readHistory } from './history';
import { createMarkService } from './marks';
import { openBuild } from './open';
import { readRecord } from './record';
import { storedHosts } from './stored-hosts';
import { createVersionCache } from './version-cache';

/**
 * Site work on a version (docs/api.md): read its build record and history (every role that may read the
 * version), mark cables and bring-up steps, attach and read photos (marks.ts, photos/).
 */
export function createBuildServices(input: DesignDeps & { photos: PhotoStore }) {
  const deps: BuildDeps = { ...input, versions: createVersionCache(storedHosts(input)) };
  const { models, sequelize } = deps;
  return {
    build: {
      async record(viewer: User, id: number, n: number): Promise<Result<BuildRecord>> {
        const opened = await openBuild(deps, viewer, id, n);
        if (!opened.ok) return opened;
        return ok(await readRecord({ models, sequelize, versions: deps.versions }, opened.value));
      },

      /** The version's bring-up checklist (the same for every read of it). */
      async checklist(viewer: User, id: number, n: number): Promise<Result<Step[]>> {
        const opened = await openBuild(deps, viewer, id, n);
        if (!opened.ok) return opened;
        return ok((await deps.versions.plan(opened.value.record.row.id, opened.value.doc)).steps);
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
