import { QueryTypes, type Sequelize } from 'sequelize';
import type { User } from '@/shared/api/auth';
import { encodeDesignCursor, type DesignCursor, type DesignListItem, type DesignsResponse, type DesignStatus, type ReviewState } from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';
import { STATE_AFTER } from './review-state';
import { seesAllVersions } from './load';

/**
 * One page of the designs list, read with what the list shows and nothing else: per design its
 * latest version (number, date, summary and review state) and its latest approved version (number
 * and approval date), each picked by an indexed subquery, and the number of matches: a page is one
 * query however many versions and review events the team has.
 *
 * A version's review state is its newest event's (review-state.ts). An approval is final (only a
 * version in review can be approved, and nothing moves an approved version on), so "the newest
 * version with an approve event" is the newest approved version.
 *
 * `q` is matched in JavaScript, as before: SQLite's lower() folds ASCII only, and "Über" must match
 * "über". That reads the names and sites of the team's designs (one small query) and pages among
 * the matching ids.
 */
type Row = {
  total: number;
  id: number;
  name: string;
  site: string | null;
  status: DesignStatus;
  updatedAt: string | Date;
  latestNumber: number | null;
  latestCreatedAt: string | Date | null;
  latestSummary: string | null;
  latestAction: keyof typeof STATE_AFTER | null;
  approvedNumber: number | null;
  approvedCreatedAt: string | Date | null;
  approvedSummary: string | null;
  approvedAt: string | Date | null;
};

const APPROVED_VERSION = `(SELECT v."id" FROM "design_versions" v WHERE v."designId" = d."id"
  AND EXISTS (SELECT 1 FROM "review_events" e WHERE e."versionId" = v."id" AND e."action" = 'approve')
  ORDER BY v."number" DESC LIMIT 1)`;

/**
 * The page's ids are picked first (by the (teamId, updatedAt, id) index, migration 0007) and only
 * those rows get their versions looked up: SQLite evaluates a SELECT list's subqueries for every
 * row before it sorts, so asking for them on the whole team and then taking 50 would read them all.
 */
const pageSql = (where: string, pageWhere: string) => `WITH "page" AS (
  SELECT d."id" FROM "designs" d WHERE ${pageWhere} ORDER BY d."updatedAt" DESC, d."id" DESC LIMIT :limit
)
SELECT (SELECT COUNT(*) FROM "designs" d WHERE ${where}) AS "total", d."id", d."name", d."site", d."status", d."updatedAt",
  lv."number" AS "latestNumber", lv."createdAt" AS "latestCreatedAt", lv."summary" AS "latestSummary",
  (SELECT e."action" FROM "review_events" e WHERE e."versionId" = lv."id" ORDER BY e."id" DESC LIMIT 1) AS "latestAction",
  av."number" AS "approvedNumber", av."createdAt" AS "approvedCreatedAt", av."summary" AS "approvedSummary",
  (SELECT e."createdAt" FROM "review_events" e WHERE e."versionId" = av."id" AND e."action" = 'approve' ORDER BY e."id" DESC LIMIT 1) AS "approvedAt"
FROM "page" JOIN "designs" d ON d."id" = "page"."id"
LEFT JOIN "design_versions" lv ON lv."id" = (SELECT v."id" FROM "design_versions" v WHERE v."designId" = d."id" ORDER BY v."number" DESC LIMIT 1)
LEFT JOIN "design_versions" av ON av."id" = ${APPROVED_VERSION}
ORDER BY d."updatedAt" DESC, d."id" DESC`;

export type ListOptions = { q?: string; limit: number; cursor?: DesignCursor };

export async function listDesigns(sequelize: Sequelize, viewer: User, options: ListOptions): Promise<DesignsResponse> {
  const all = seesAllVersions(viewer);
  const filters = ['d."teamId" = :teamId'];
  const replacements: Record<string, unknown> = { teamId: viewer.teamId, limit: options.limit + 1 };
  // Installers see only designs with an approved version (docs/api.md's role table).
  if (!all) filters.push(`EXISTS ${APPROVED_VERSION}`);
  const needle = options.q?.trim().toLocaleLowerCase();
  if (needle) {
    const ids = await matchingIds(sequelize, viewer.teamId, needle);
    if (ids.length === 0) return { designs: [], nextCursor: null, total: 0 };
    filters.push('d."id" IN (:ids)');
    replacements.ids = ids;
  }
  const where = filters.join(' AND ');
  const page = [...filters];
  if (options.cursor) {
    page.push('(d."updatedAt" < :after OR (d."updatedAt" = :after AND d."id" < :afterId))');
    replacements.after = new Date(options.cursor.updatedAt);
    replacements.afterId = options.cursor.id;
  }
  const rows = await sequelize.query<Row>(pageSql(where, page.join(' AND ')), { replacements, type: QueryTypes.SELECT });
  // The count rides on the page's rows; a page past the end has none, and is counted on its own.
  const total = rows.length > 0 ? Number(rows[0].total) : await count(sequelize, where, replacements);
  const shown = rows.slice(0, options.limit);
  const last = shown[shown.length - 1];
  const nextCursor = rows.length > options.limit && last ? encodeDesignCursor({ updatedAt: asDate(last.updatedAt).getTime(), id: last.id }) : null;
  return { designs: shown.map((row) => toItem(row, all)), nextCursor, total };
}

async function count(sequelize: Sequelize, where: string, replacements: Record<string, unknown>): Promise<number> {
  const [row] = await sequelize.query<{ total: number }>(`SELECT COUNT(*) AS "total" FROM "designs" d WHERE ${where}`, { replacements, type: QueryTypes.SELECT });
  return Number(row.total);
}

async function matchingIds(sequelize: Sequelize, teamId: number, needle: string): Promise<number[]> {
  const rows = await sequelize.query<{ id: number; name: string; site: string | null }>(
    'SELECT "id", "name", "site" FROM "designs" WHERE "teamId" = :teamId',
    { replacements: { teamId }, type: QueryTypes.SELECT },
  );
  return rows.filter((r) => [r.name, r.site ?? ''].some((text) => text.toLocaleLowerCase().includes(needle))).map((r) => r.id);
}

function toItem(row: Row, all: boolean): DesignListItem {
  const approved =
    row.approvedNumber !== null && row.approvedAt !== null
      ? { number: row.approvedNumber, approvedAt: asDate(row.approvedAt).toISOString() }
      : null;
  // An installer's newest version is the newest approved one, and to them the design is approved.
  const latest = all
    ? row.latestNumber === null
      ? null
      : version(row.latestNumber, row.latestCreatedAt, row.latestSummary, row.latestAction ? STATE_AFTER[row.latestAction] : 'draft')
    : version(row.approvedNumber, row.approvedCreatedAt, row.approvedSummary, 'approved');
  return {
    id: row.id,
    name: row.name,
    site: row.site,
    status: all ? row.status : 'approved',
    latestVersion: latest,
    approvedVersion: approved,
    updatedAt: asDate(row.updatedAt).toISOString(),
  };
}

function version(number: number | null, createdAt: string | Date | null, summary: string | null, review: ReviewState): DesignListItem['latestVersion'] {
  if (number === null || createdAt === null || summary === null) return null;
  return { number, createdAt: asDate(createdAt).toISOString(), summary: JSON.parse(summary) as ReportSummary, review };
}

/** SQLite hands dates back as text ('2026-12-02 05:10:16.449 +00:00'); PostgreSQL as Date objects. */
function asDate(value: string | Date): Date {
  return value instanceof Date ? value : new Date(value);
}
