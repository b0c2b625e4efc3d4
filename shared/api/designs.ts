import { z } from 'zod';
import type { ReportSummary } from '../analysis/summary';
import type { Report } from '../analysis/types';
import type { TopologyDiff } from '../diff/types';
import type { Topology } from '../topology/schema';
import { cleanText } from '../text/clean';

/**
 * Bodies, params and answers of the designs and versions routes (docs/api.md). The document itself is
 * checked by `validateTopology` (shared/topology/validate.ts), which reports every problem with its
 * path; here it is only required to be present, so that its issues come out with `document.` paths.
 */

export const DESIGN_STATUSES = ['draft', 'in-review', 'approved', 'changes-requested'] as const;
export type DesignStatus = (typeof DESIGN_STATUSES)[number];

/** The review state of one version: its latest review event, or draft when it has none. */
export type ReviewState = DesignStatus;

export const REVIEW_ACTIONS = ['submit', 'approve', 'request-changes'] as const;
export type ReviewAction = (typeof REVIEW_ACTIONS)[number];

/**
 * Names, sites and messages are shown in lists, e-mails and printouts: control and text-direction
 * characters are taken out first (cleanText), so a name cannot reverse or hide the text after it.
 * Review comments keep their line breaks; each line is cleaned.
 */
const cleaned = () => z.string().transform(cleanText);
const designName = cleaned().pipe(z.string().trim().min(1, 'Give the design a name').max(120, 'Use at most 120 characters'));
const site = cleaned().pipe(z.string().trim().max(120, 'Use at most 120 characters'));
const message = cleaned().pipe(z.string().trim().min(1, 'Say what changed in this version').max(500, 'Use at most 500 characters'));

/** Each line of a multi-line text cleaned on its own, the line breaks kept (CR LF read as LF). */
export function cleanLines(text: string): string {
  return text.split(/\r\n|\n|\r/).map(cleanText).join('\n');
}

export const designIdParams = z.object({ id: z.coerce.number().int().positive() }).strict();
export const versionParams = z
  .object({ id: z.coerce.number().int().positive(), n: z.coerce.number().int().positive() })
  .strict();
export const diffQuery = z.object({ against: z.coerce.number().int().positive() }).strict();
/** How many designs one page of GET /api/designs holds at most, unless `limit` says fewer. */
export const DESIGN_PAGE_SIZE = 50;
export const MAX_DESIGN_PAGE_SIZE = 100;

/** A position in the designs list (most recently changed first): after the design changed at `updatedAt` with `id`. */
export type DesignCursor = { updatedAt: number; id: number };

/** Cursors are `<updatedAt in ms>.<id>`; clients pass back the `nextCursor` they were given and never build one. */
export function encodeDesignCursor(cursor: DesignCursor): string {
  return `${cursor.updatedAt}.${cursor.id}`;
}

const designCursor = z
  .string()
  .regex(/^\d{1,15}\.\d{1,15}$/, 'Use the nextCursor of the previous page')
  .transform((value): DesignCursor => {
    const [updatedAt, id] = value.split('.').map(Number);
    return { updatedAt, id };
  });

export const designListQuery = z
  .object({
    q: z.string().max(120).optional(),
    limit: z.coerce.number().int().min(1).max(MAX_DESIGN_PAGE_SIZE, `Ask for at most ${MAX_DESIGN_PAGE_SIZE} designs at a time`).default(DESIGN_PAGE_SIZE),
    cursor: designCursor.optional(),
  })
  .strict();
export type DesignListQuery = z.infer<typeof designListQuery>;

export const createDesignBody = z
  .object({ name: designName, site: site.optional(), document: z.unknown().optional(), message: message.optional() })
  .strict();
export type CreateDesignBody = z.infer<typeof createDesignBody>;

export const saveVersionBody = z
  .object({
    baseVersion: z.number().int().positive().nullable(),
    message,
    document: z.unknown().refine((value) => value !== undefined, 'A version needs its topology document'),
  })
  .strict();
export type SaveVersionBody = z.infer<typeof saveVersionBody>;

export const restoreBody = z.object({ message }).strict();
export type RestoreBody = z.infer<typeof restoreBody>;

export const reviewBody = z
  .object({
    action: z.enum(REVIEW_ACTIONS),
    comment: z.string().transform(cleanLines).pipe(z.string().trim().max(4000, 'Use at most 4000 characters')).optional(),
  })
  .strict();
export type ReviewBody = z.infer<typeof reviewBody>;

export type Person = { id: number; name: string };

export type ReviewEventDto = {
  id: number;
  action: ReviewAction;
  comment: string | null;
  /** True when a version with error findings was approved; the comment is the reason given. */
  override: boolean;
  actor: Person;
  createdAt: string;
};

export type VersionReview = { state: ReviewState; events: ReviewEventDto[] };

export type VersionSummary = {
  number: number;
  message: string;
  author: Person;
  createdAt: string;
  summary: ReportSummary;
  contentHash: string;
  review: VersionReview;
};

export type VersionDetail = VersionSummary & { document: Topology };

export type DesignListItem = {
  id: number;
  name: string;
  site: string | null;
  status: DesignStatus;
  /** The newest version the caller may see (installers: the newest approved one), or null. */
  latestVersion: { number: number; createdAt: string; summary: ReportSummary; review: ReviewState } | null;
  /** The newest approved version the caller may see and when it was approved, or null: a newer draft never hides it. */
  approvedVersion: { number: number; approvedAt: string } | null;
  updatedAt: string;
};

export type DesignDto = DesignListItem & { createdAt: string; createdBy: Person | null };

/**
 * GET /api/designs?q=&limit=&cursor= — one page of the caller's team's designs, most recently changed
 * first. `nextCursor` asks for the page after this one (null on the last page); `total` counts every
 * design matching `q` that the caller may see.
 */
export type DesignsResponse = { designs: DesignListItem[]; nextCursor: string | null; total: number };
/**
 * GET /api/designs/:id — `versions` newest first, without documents. For installers: only approved
 * versions, `design.status` is "approved", and a design with no approved version answers 404.
 */
export type DesignResponse = { design: DesignDto; versions: VersionSummary[] };
export type CreateDesignResponse = { design: DesignDto; version: VersionSummary | null };
export type VersionResponse = { version: VersionDetail };
export type SaveVersionResponse = { version: VersionSummary };
export type ReportResponse = { report: Report; summary: ReportSummary };
/**
 * GET …/versions/:n/report-page — what the report screen shows, in one answer: the design (as in
 * DesignResponse), the version with its document (as in VersionResponse), and its report and summary
 * (as in ReportResponse).
 */
export type ReportPageResponse = ReportResponse & { design: DesignDto; version: VersionDetail };
/** GET …/versions/:n/after-one (api.md `--after-one`). */
export type AfterOneResponse = { afterOneFailure: NonNullable<Report['afterOneFailure']> };
export type ReviewResponse = { review: VersionReview; design: DesignDto };
/** GET …/versions/:n/diff?against=m — what changed going from version m (before) to version n (after). */
export type DiffResponse = { diff: TopologyDiff };

/**
 * The 409 body of a save whose baseVersion is not the latest: `latestVersion` is the number to
 * reload and build on, or null when the design has no version yet (then save with baseVersion null).
 */
export type SaveConflictBody = { error: string; latestVersion: number | null };
