import { z } from 'zod';
import type { Step } from '../build/steps';
import type { IdRecord } from '../keys/record';
import { cleanText } from '../text/clean';
import type { Person } from './designs';

/**
 * Bodies, params and answers of the site-work routes (docs/api.md): the build record of an approved
 * version — cable marks, bring-up step marks, photos — and its progress. Records in answers are
 * keyed by cable, step and rack ids, which are user text: they are built without a prototype on
 * the server and must be read with `ownValue` (shared/keys/record.ts) on the client.
 */

export const CABLE_STATES = ['not-started', 'run', 'tested', 'problem'] as const;
export type CableState = (typeof CABLE_STATES)[number];

/** A cable counts as done when it is tested: run but untested is still work to do. */
export const DONE_STATE: CableState = 'tested';

export const NOTE_MAX = 2000;
export const STEP_ID_MAX = 2000;
/** Topology ids are at most 200 characters (shared/topology/schema.ts). */
const ID_MAX = 200;

const note = z
  .string()
  .max(NOTE_MAX, `Use at most ${NOTE_MAX} characters`)
  .transform((text) => cleanText(text).trim())
  .optional();

/** A UUID made by the phone for one mark, so a replay of its offline queue stores nothing twice (RFC 9562). */
export const clientIdSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.uuid({ message: 'Use a UUID made on the device for this mark' }));

const cableId = z.string().min(1, 'Name the cable').max(ID_MAX, `Use at most ${ID_MAX} characters`);
const rackId = z.string().min(1, 'Name the rack').max(ID_MAX, `Use at most ${ID_MAX} characters`);

export const PROBLEM_NEEDS_NOTE = 'Say what the problem is, so the next person knows what to fix';

export const markBody = z
  .object({ cableId, state: z.enum(CABLE_STATES), note, clientId: clientIdSchema })
  .strict()
  .superRefine((body, ctx) => {
    if (body.state === 'problem' && !body.note) ctx.addIssue({ code: 'custom', path: ['note'], message: PROBLEM_NEEDS_NOTE });
  });
export type MarkBody = z.input<typeof markBody>;
export type ParsedMarkBody = z.output<typeof markBody>;

export const stepBody = z
  .object({
    stepId: z.string().min(1, 'Name the step').max(STEP_ID_MAX, `Use at most ${STEP_ID_MAX} characters`),
    done: z.boolean({ error: 'Say whether the step is done (true or false)' }),
    note,
    clientId: clientIdSchema,
  })
  .strict();
export type StepBody = z.input<typeof stepBody>;
export type ParsedStepBody = z.output<typeof stepBody>;

/** The text fields of a photo upload (multipart): exactly one of cableId and rackId. */
export const photoFields = z
  .object({ cableId: cableId.optional(), rackId: rackId.optional() })
  .strict()
  .superRefine((fields, ctx) => {
    if ((fields.cableId === undefined) === (fields.rackId === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['cableId'], message: 'Attach the photo to one cable (cableId) or one rack (rackId)' });
    }
  });
export type PhotoFields = z.output<typeof photoFields>;

export const photoParams = z.object({ id: z.uuid({ message: 'is not a photo id' }) }).strict();

export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];

export type CableMark = {
  id: number;
  cableId: string;
  state: CableState;
  note: string | null;
  by: Person;
  at: string;
  clientId: string;
};

export type StepMark = {
  id: number;
  stepId: string;
  done: boolean;
  note: string | null;
  by: Person;
  at: string;
  clientId: string;
};

/** A cable's current state: its latest mark, or not-started with nobody when it has none. */
export type CableStatus = { state: CableState; note: string | null; by: Person | null; at: string | null };
export type StepStatus = { done: boolean; note: string | null; by: Person | null; at: string | null };

export type Photo = { id: string; cableId: string | null; rackId: string | null; by: Person; at: string; bytes: number; contentType: PhotoType };

export type Count = { done: number; total: number };

/**
 * Progress of one rack: the cables with an end in it (a cable between two racks counts in both)
 * and the steps about it or its devices. `rackId` null gathers what is not placed in a rack.
 */
export type RackProgress = { rackId: string | null; rack: string | null; cables: Count; steps: Count };

export type BuildProgress = {
  cables: Count;
  steps: Count;
  /** Cables per current state, for a summary line ("3 run, 1 problem"). */
  states: Record<CableState, number>;
  racks: RackProgress[];
};

export type BuildRecord = {
  designId: number;
  number: number;
  /** Marks are taken on approved versions only; an admin reading a draft sees an empty record. */
  accepting: boolean;
  /** A newer approved version of the design, or null: this one is no longer the one to build from. */
  supersededBy: { number: number; approvedAt: string } | null;
  /** Every cable of the version, by cable id. */
  cables: IdRecord<CableStatus>;
  /** Every bring-up step of the version's checklist (GET …/build/checklist), by step id. */
  steps: IdRecord<StepStatus>;
  photos: { cables: IdRecord<Photo[]>; racks: IdRecord<Photo[]> };
  progress: BuildProgress;
  /** Every cable tested and every step done. */
  complete: boolean;
  /** When the record first became complete (the completion e-mail went out then), or null. */
  completedAt: string | null;
};

/** GET …/versions/:n/build */
export type BuildResponse = { build: BuildRecord };
/**
 * GET …/versions/:n/build/checklist — the bring-up steps in order (shared/build/steps.ts). A version
 * never changes, so neither does its checklist: fetch it once. It is apart from the record, which is
 * read again and again while people mark, because it is large for a large design (the steps' text).
 */
export type ChecklistResponse = { checklist: Step[] };
/** POST …/build/marks — 201 for a new mark, 200 with the stored one when its clientId was seen before. */
export type MarkResponse = { mark: CableMark };
/** POST …/build/steps — the same rules. */
export type StepMarkResponse = { mark: StepMark };
/** One entry of the history: a cable mark or a step mark. */
export type HistoryEntry = ({ kind: 'cable' } & CableMark) | ({ kind: 'step' } & StepMark);
/** GET …/build/history — oldest first. */
export type HistoryResponse = { marks: HistoryEntry[] };
/** POST …/build/photos */
export type PhotoResponse = { photo: Photo };
