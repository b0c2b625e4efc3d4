import type { User } from '@/shared/api/auth';
import type {
  DesignDto,
  DesignListItem,
  DesignStatus,
  Person,
  ReviewEventDto,
  VersionDetail,
  VersionReview,
  VersionSummary,
} from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';
import type { Topology } from '@/shared/topology/schema';
import type { UserRow } from '@/server/models';
import { seesAllVersions, type DesignView, type VersionRecord } from './load';

type People = Map<number, UserRow>;

/** A person as versions and reviews show them; a row that is somehow missing still reads as someone. */
export function toPerson(people: People, id: number): Person {
  const user = people.get(id);
  return { id, name: user ? user.name : 'Former member' };
}

export function toReview(record: VersionRecord, people: People): VersionReview {
  const events = record.events.map(
    (e): ReviewEventDto => ({
      id: e.id,
      action: e.action,
      comment: e.comment,
      override: e.override,
      actor: toPerson(people, e.actorId),
      createdAt: e.createdAt.toISOString(),
    }),
  );
  return { state: record.state, events };
}

export function toVersionSummary(record: VersionRecord, people: People): VersionSummary {
  const { row } = record;
  return {
    number: row.number,
    message: row.message,
    author: toPerson(people, row.authorId),
    createdAt: row.createdAt.toISOString(),
    summary: JSON.parse(row.summary) as ReportSummary,
    contentHash: row.contentHash,
    review: toReview(record, people),
  };
}

export function toVersionDetail(record: VersionRecord, people: People, document: Topology): VersionDetail {
  return { ...toVersionSummary(record, people), document };
}

/**
 * An installer sees only approved versions, so to them a design they can open is approved, whatever
 * a newer draft or review of it says.
 */
function statusFor(viewer: User, status: DesignStatus): DesignStatus {
  return seesAllVersions(viewer) ? status : 'approved';
}

/** The newest approved version of those the viewer may see, dated by its latest approval. */
export function approvedVersionOf(view: DesignView): DesignListItem['approvedVersion'] {
  const approved = view.versions.find((v) => v.state === 'approved');
  if (!approved) return null;
  let at: Date | null = null;
  for (const e of approved.events) if (e.action === 'approve' && (!at || e.createdAt > at)) at = e.createdAt;
  return { number: approved.row.number, approvedAt: (at ?? approved.row.createdAt).toISOString() };
}

export function toDesignDto(view: DesignView, viewer: User): DesignDto {
  const { design } = view;
  return {
    ...toListItem(view, viewer),
    createdAt: design.createdAt.toISOString(),
    createdBy: design.createdById === null ? null : toPerson(view.people, design.createdById),
  };
}

/** A design as the list shows it, from a loaded view (the list itself is read by list.ts in one query). */
export function toListItem(view: DesignView, viewer: User): DesignListItem {
  const { design } = view;
  const [latest] = view.versions;
  return {
    id: design.id,
    name: design.name,
    site: design.site,
    status: statusFor(viewer, design.status),
    latestVersion: latest
      ? {
          number: latest.row.number,
          createdAt: latest.row.createdAt.toISOString(),
          summary: JSON.parse(latest.row.summary) as ReportSummary,
          review: latest.state,
        }
      : null,
    approvedVersion: approvedVersionOf(view),
    updatedAt: design.updatedAt.toISOString(),
  };
}
