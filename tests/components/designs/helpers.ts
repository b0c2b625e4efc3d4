import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import type { User } from '@/shared/api/auth';
import type { DesignDto, DesignResponse, ReviewEventDto, ReviewState, VersionDetail, VersionSummary } from '@/shared/api/designs';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { Topology } from '@/shared/topology/schema';
import { demoUsers } from '../helpers/render';

/**
 * Answers shaped like the designs routes', built from the Harbor Road demo documents with the real
 * analysis, so a screen under test shows what the server would send for the same data.
 */
export const people = {
  ...demoUsers,
  reviewer: { id: 3, email: 'theo@tidewater.example', name: 'Theo Brandt', role: 'reviewer', teamId: 1 },
} satisfies Record<string, User>;

export const docs = { v1: harborRoadV1(), v2: harborRoadV2() };

export function event(id: number, action: ReviewEventDto['action'], actor: User, comment: string | null = null, override = false): ReviewEventDto {
  return { id, action, comment, override, actor: { id: actor.id, name: actor.name }, createdAt: `2026-11-2${id}T10:00:00.000Z` };
}

type VersionOptions = { number: number; doc: Topology; author?: User; state?: ReviewState; events?: ReviewEventDto[]; message?: string };

export function versionSummary({ number, doc, author = people.designer, state = 'draft', events = [], message }: VersionOptions): VersionSummary {
  return {
    number,
    message: message ?? `Version ${number} of Harbor Road`,
    author: { id: author.id, name: author.name },
    createdAt: `2026-11-1${number}T09:00:00.000Z`,
    summary: summarize(analyze(doc), doc),
    contentHash: `hash-${number}`,
    review: { state, events },
  };
}

export function versionDetail(options: VersionOptions): VersionDetail {
  return { ...versionSummary(options), document: options.doc };
}

export const harborDesign: DesignDto = {
  id: 1,
  name: 'Harbor Road storage',
  site: 'Harbor Road server room',
  status: 'approved',
  latestVersion: { number: 2, createdAt: '2026-11-12T09:00:00.000Z', summary: summarize(analyze(docs.v2), docs.v2), review: 'approved' },
  approvedVersion: { number: 2, approvedAt: '2026-11-26T15:00:00.000Z' },
  createdAt: '2026-11-11T09:00:00.000Z',
  updatedAt: '2026-11-26T15:00:00.000Z',
  createdBy: { id: 2, name: 'Ravi Menon' },
};

export function designResponse(versions: VersionSummary[], design: Partial<DesignDto> = {}): DesignResponse {
  return { design: { ...harborDesign, ...design }, versions };
}
