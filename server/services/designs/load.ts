import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { ReviewState } from '@/shared/api/designs';
import { can } from '@/shared/roles';
import type { DesignRow, DesignVersionRow, Models, ReviewEventRow, UserRow } from '@/server/models';
import { versionState } from './review-state';

/** A version's row (without its document, which only the routes that need it read) and its review thread. */
export type VersionRecord = { row: DesignVersionRow; events: ReviewEventRow[]; state: ReviewState };

/**
 * One design as a viewer may see it. `versions` are the ones the viewer may open, newest first
 * (installers: approved ones only); `all` is every version, for the rules that need the whole history.
 */
export type DesignView = {
  design: DesignRow;
  versions: VersionRecord[];
  all: VersionRecord[];
  people: Map<number, UserRow>;
};

/** Admins, designers and reviewers read every version; installers only approved ones (docs/api.md's role table). */
export function seesAllVersions(viewer: User): boolean {
  return can(viewer.role, 'readAllVersions');
}

const META = ['id', 'designId', 'number', 'message', 'authorId', 'summary', 'contentHash', 'createdAt'] as const;

/** Designs matching `where` with their versions' metadata, review events and the people named on them. */
export async function loadDesignViews(
  models: Models,
  viewer: User,
  where: WhereOptions<DesignRow>,
  transaction?: Transaction,
): Promise<DesignView[]> {
  const designs = await models.Design.findAll({ where, order: [['updatedAt', 'DESC'], ['id', 'DESC']], transaction });
  if (designs.length === 0) return [];
  const rows = await models.DesignVersion.findAll({
    attributes: [...META],
    where: { designId: { [Op.in]: designs.map((d) => d.id) } },
    order: [['number', 'DESC']],
    transaction,
  });
  const events = rows.length
    ? await models.ReviewEvent.findAll({ where: { versionId: { [Op.in]: rows.map((r) => r.id) } }, order: [['id', 'ASC']], transaction })
    : [];
  const eventsOf = groupBy(events, (e) => e.versionId);
  const records = rows.map((row): VersionRecord => {
    const own = eventsOf.get(row.id) ?? [];
    return { row, events: own, state: versionState(own) };
  });
  const recordsOf = groupBy(records, (r) => r.row.designId);
  const people = await loadPeople(models, designs, records, transaction);
  const all = seesAllVersions(viewer);
  return designs
    .map((design): DesignView => {
      const versions = recordsOf.get(design.id) ?? [];
      return { design, all: versions, versions: all ? versions : versions.filter((v) => v.state === 'approved'), people };
    })
    .filter((view) => all || view.versions.length > 0);
}

/**
 * The viewer's team's design `id`, or null. Another team's design and, for an installer, a design
 * with no approved version are null too: the caller answers 404 either way and reveals nothing.
 */
export async function loadDesignView(models: Models, viewer: User, id: number, transaction?: Transaction): Promise<DesignView | null> {
  const [view] = await loadDesignViews(models, viewer, { id, teamId: viewer.teamId }, transaction);
  return view ?? null;
}

export function findVersion(view: DesignView, number: number): VersionRecord | undefined {
  return view.versions.find((v) => v.row.number === number);
}

/** The stored document of a version; it was validated when it was saved. */
export async function loadDocument(models: Models, versionId: number, transaction?: Transaction): Promise<unknown> {
  return JSON.parse(await loadDocumentText(models, versionId, transaction)) as unknown;
}

/** The stored document as the JSON text it was saved as. */
export async function loadDocumentText(models: Models, versionId: number, transaction?: Transaction): Promise<string> {
  const row = await models.DesignVersion.findByPk(versionId, { attributes: ['id', 'document'], transaction });
  if (!row) throw new Error(`version row ${versionId} vanished`);
  return row.document;
}

/** Removed members stay in this map: versions and reviews keep naming who made them. */
async function loadPeople(models: Models, designs: DesignRow[], records: VersionRecord[], transaction?: Transaction) {
  const ids = new Set<number>();
  for (const d of designs) if (d.createdById !== null) ids.add(d.createdById);
  for (const r of records) {
    ids.add(r.row.authorId);
    for (const e of r.events) ids.add(e.actorId);
  }
  const users = await models.User.findAll({ where: { id: { [Op.in]: [...ids] } }, transaction });
  return new Map(users.map((u) => [u.id, u]));
}

function groupBy<T, K>(items: readonly T[], key: (item: T) => K): Map<K, T[]> {
  const map = new Map<K, T[]>();
  for (const item of items) {
    const k = key(item);
    const list = map.get(k);
    if (list) list.push(item);
    else map.set(k, [item]);
  }
  return map;
}
