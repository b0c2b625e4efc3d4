import type { User } from '@/shared/api/auth';
import type { CreateDesignBody, CreateDesignResponse, DesignListQuery, DesignResponse, DesignsResponse } from '@/shared/api/designs';
import { fail, ok, type Result } from '@/server/services/result';
import { writeTransaction, type DesignDeps, type Within } from './deps';
import { toDesignDto, toVersionSummary } from './dto';
import { listDesigns } from './list';
import { loadDesignView } from './load';
import { DEFAULT_FIRST_MESSAGE, NO_SUCH_DESIGN } from './messages';
import { appendVersion, type PreparedDocument } from './write';

/** The team's designs: list, read one with its versions, create one (optionally with version 1). */
export function createDesignService(deps: DesignDeps) {
  const { models, now, analysis } = deps;

  return {
    /**
     * One page of the caller's team's designs, most recently changed first; `q` matches name or
     * site, ignoring case (list.ts).
     */
    async list(viewer: User, query: DesignListQuery): Promise<Result<DesignsResponse>> {
      return ok(await listDesigns(deps.sequelize, viewer, query));
    },

    /** One design with the versions the caller may open, newest first. */
    async get(viewer: User, id: number): Promise<Result<DesignResponse>> {
      const view = await loadDesignView(models, viewer, id);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      return ok({ design: toDesignDto(view, viewer), versions: view.versions.map((v) => toVersionSummary(v, view.people)) });
    },

    /** A new design; with a document, that document becomes version 1 in the same transaction. */
    async create(viewer: User, body: CreateDesignBody, within: Within = {}): Promise<Result<CreateDesignResponse>> {
      let prepared: PreparedDocument | null = null;
      if (body.document !== undefined) {
        const result = await analysis.prepare(body.document);
        if (!result.ok) return result;
        prepared = result.value;
      }
      const at = now();
      const id = await writeTransaction(deps, within, async (transaction) => {
        const design = await models.Design.create(
          { teamId: viewer.teamId, name: body.name, site: body.site || null, status: 'draft', createdById: viewer.id, createdAt: at, updatedAt: at },
          { transaction },
        );
        if (prepared) {
          const message = body.message ?? DEFAULT_FIRST_MESSAGE;
          await appendVersion(models, transaction, { designId: design.id, authorId: viewer.id, message, prepared, at });
        }
        return design.id;
      });
      const view = await loadDesignView(models, viewer, id, within.transaction);
      if (!view) throw new Error(`design ${id} not readable right after it was created`);
      const [version] = view.versions;
      return ok({ design: toDesignDto(view, viewer), version: version ? toVersionSummary(version, view.people) : null });
    },
  };
}

export type DesignService = ReturnType<typeof createDesignService>;
