import { z } from 'zod';
import { createJSONStorage, persist, type StateStorage } from 'zustand/middleware';
import { createStore, type StoreApi } from 'zustand/vanilla';
import { CABLE_STATES, markBody, stepBody, type CableState } from '@/shared/api/build';
import { toIssues, type Issue } from '@/shared/api/common';
import { newClientId } from '@/lib/build/client-id';

/**
 * The phone's queue of cable and step marks not yet on the server. Every mark goes through it, so a
 * mark made in a server room without signal is kept — in localStorage on the web, so a reload or a
 * closed tab loses nothing — shown as waiting to send, and sent in the order it was made when the
 * connection returns. Each item carries the clientId made when it was queued; the server stores one
 * mark per clientId, so sending an item again after a lost answer doubles nothing.
 *
 * Sending (`flush`) goes item by item, oldest first, one flush at a time:
 * - sent (2xx): the item leaves the queue;
 * - no answer (status 0), the server busy or failing (408, 425, 429, 5xx) or the session ended (401):
 *   the item stays waiting and the flush stops, so nothing behind it overtakes it;
 * - refused (any other 4xx, e.g. a version no longer open to marks): the item stays, marked refused
 *   with the server's sentence, for the installer to retry or discard; the flush goes on.
 * Photos are not queued: they go straight to the server (lib/api/build.ts).
 */
export type QueueStatus = 'waiting' | 'sending' | 'refused';
export type MarkFields = { cableId: string; state: CableState; note?: string };
export type StepFields = { stepId: string; done: boolean; note?: string };

/** Which version a mark is for, and who made it: only they send it (another account on the same phone waits). */
export type QueueTarget = { designId: number; version: number; userId: number };

type Common = QueueTarget & {
  clientId: string;
  queuedAt: string;
  attempts: number;
  status: QueueStatus;
  /** The last failure's sentence (the server's, or "no connection"), or null. */
  error: string | null;
};
export type QueuedMark = Common & { kind: 'mark'; fields: MarkFields };
export type QueuedStep = Common & { kind: 'step'; fields: StepFields };
export type QueuedItem = QueuedMark | QueuedStep;

/** Sends one item; throws on failure, with `status` (0 or absent for no answer) and `message`. */
export type Sender = (item: QueuedItem) => Promise<void>;

export type FlushReport = {
  sent: string[];
  refused: string[];
  /** Why the flush stopped with items still waiting, or null when it got through them all. */
  stopped: 'offline' | 'signed-out' | 'server' | null;
};

export type BuildQueueState = {
  items: QueuedItem[];
  /** True while a flush runs (not persisted). */
  flushing: boolean;
  /** Queue a cable mark; throws QueueInputError for fields the server would refuse (a problem needs a note). */
  enqueueMark(target: QueueTarget, fields: MarkFields): QueuedMark;
  enqueueStep(target: QueueTarget, fields: StepFields): QueuedStep;
  /** Take a waiting or refused item out (undo before it was sent); false when it is being sent or gone. */
  discard(clientId: string): boolean;
  /** Put a refused item back to waiting. */
  retry(clientId: string): void;
  /** Send the waiting items of `userId` (the signed-in account), oldest first. */
  flush(send: Sender, userId: number): Promise<FlushReport>;
};

export type BuildQueue = StoreApi<BuildQueueState>;

/** A mark the server would refuse whatever happens (a problem without a note, say): it is not queued. */
export class QueueInputError extends Error {
  constructor(readonly issues: Issue[]) {
    super(issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; '));
    this.name = 'QueueInputError';
  }
}

/** Check fields with the route's own schema before they are queued. */
function checked<T>(schema: typeof markBody | typeof stepBody, fields: T): void {
  const parsed = schema.safeParse({ ...fields, clientId: '00000000-0000-4000-8000-000000000000' });
  if (!parsed.success) throw new QueueInputError(toIssues(parsed.error));
}

export const QUEUE_STORAGE_KEY = 'cablewright.build-queue.v1';

type Verdict = 'refused' | 'offline' | 'signed-out' | 'server';

/** How a failed send is treated (see the module comment). */
export function classifyFailure(error: unknown): Verdict {
  const status = (error as { status?: unknown } | null)?.status;
  if (typeof status !== 'number' || status === 0) return 'offline';
  if (status === 401) return 'signed-out';
  if (status === 408 || status === 425 || status === 429 || status >= 500) return 'server';
  return status >= 400 ? 'refused' : 'server';
}

function failureText(error: unknown, verdict: Verdict): string {
  const message = (error as { message?: unknown } | null)?.message;
  if (verdict === 'offline') return 'No connection; waiting to send.';
  return typeof message === 'string' && message ? message : 'The server did not take this mark.';
}

const note = z.string().max(2000).optional();
const common = {
  clientId: z.string().min(1).max(64),
  designId: z.number().int().positive(),
  version: z.number().int().positive(),
  userId: z.number().int().positive(),
  queuedAt: z.string(),
  attempts: z.number().int().min(0),
  status: z.enum(['waiting', 'sending', 'refused']),
  error: z.string().nullable(),
};
const itemSchema = z.discriminatedUnion('kind', [
  z.object({ ...common, kind: z.literal('mark'), fields: z.object({ cableId: z.string().min(1), state: z.enum(CABLE_STATES), note }) }),
  z.object({ ...common, kind: z.literal('step'), fields: z.object({ stepId: z.string().min(1), done: z.boolean(), note }) }),
]);

/** What was persisted, read tolerantly: items that do not parse are dropped; one that was being sent waits again. */
export function restoreItems(persisted: unknown): QueuedItem[] {
  const list = (persisted as { items?: unknown } | null)?.items;
  if (!Array.isArray(list)) return [];
  const items: QueuedItem[] = [];
  for (const candidate of list) {
    const parsed = itemSchema.safeParse(candidate);
    if (parsed.success) items.push({ ...parsed.data, status: parsed.data.status === 'sending' ? 'waiting' : parsed.data.status } as QueuedItem);
  }
  return items;
}

function memoryStorage(): StateStorage {
  const data = new Map<string, string>();
  return { getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v), removeItem: (k) => void data.delete(k) };
}

export type QueueOptions = {
  /** Where the queue is kept; localStorage on the web (defaultQueueStorage). Null keeps it in memory only. */
  storage?: StateStorage | null;
  newId?: () => string;
  now?: () => Date;
};

export function createBuildQueue({ storage = null, newId = newClientId, now = () => new Date() }: QueueOptions = {}): BuildQueue {
  let running: Promise<FlushReport> | null = null;
  let again = false;
  return createStore<BuildQueueState>()(
    persist(
      (set, get) => {
        const update = (clientId: string, change: Partial<Common>) =>
          set((s) => ({ items: s.items.map((i) => (i.clientId === clientId ? ({ ...i, ...change } as QueuedItem) : i)) }));
        const remove = (clientId: string) => set((s) => ({ items: s.items.filter((i) => i.clientId !== clientId) }));
        const base = ({ designId, version, userId }: QueueTarget): Common => ({
          clientId: newId(),
          designId,
          version,
          userId,
          queuedAt: now().toISOString(),
          attempts: 0,
          status: 'waiting',
          error: null,
        });

        async function run(send: Sender, userId: number): Promise<FlushReport> {
          const report: FlushReport = { sent: [], refused: [], stopped: null };
          set({ flushing: true });
          try {
            for (;;) {
              const next = get().items.find((i) => i.status === 'waiting' && i.userId === userId);
              if (!next) break;
              update(next.clientId, { status: 'sending', attempts: next.attempts + 1 });
              try {
                await send(next);
                remove(next.clientId);
                report.sent.push(next.clientId);
              } catch (error) {
                const verdict = classifyFailure(error);
                if (verdict === 'refused') {
                  update(next.clientId, { status: 'refused', error: failureText(error, verdict) });
                  report.refused.push(next.clientId);
                  continue;
                }
                update(next.clientId, { status: 'waiting', error: failureText(error, verdict) });
                report.stopped = verdict;
                break;
              }
            }
          } finally {
            set({ flushing: false });
          }
          return report;
        }

        return {
          items: [],
          flushing: false,
          enqueueMark(target, fields) {
            checked(markBody, fields);
            const item: QueuedMark = { ...base(target), kind: 'mark', fields };
            set((s) => ({ items: [...s.items, item] }));
            return item;
          },
          enqueueStep(target, fields) {
            checked(stepBody, fields);
            const item: QueuedStep = { ...base(target), kind: 'step', fields };
            set((s) => ({ items: [...s.items, item] }));
            return item;
          },
          discard(clientId) {
            const item = get().items.find((i) => i.clientId === clientId);
            if (!item || item.status === 'sending') return false;
            remove(clientId);
            return true;
          },
          retry(clientId) {
            const item = get().items.find((i) => i.clientId === clientId);
            if (item?.status === 'refused') update(clientId, { status: 'waiting', error: null });
          },
          flush(send, userId) {
            // A call while a flush runs joins it, and makes it look again before it ends: the item that
            // call was made for may have been queued after the running flush's last look.
            if (running) {
              again = true;
              return running;
            }
            running = (async () => {
              const report: FlushReport = { sent: [], refused: [], stopped: null };
              try {
                do {
                  again = false;
                  const round = await run(send, userId);
                  report.sent.push(...round.sent);
                  report.refused.push(...round.refused);
                  report.stopped = round.stopped;
                } while (again && report.stopped === null);
              } finally {
                running = null;
              }
              return report;
            })();
            return running;
          },
        };
      },
      {
        name: QUEUE_STORAGE_KEY,
        version: 1,
        storage: createJSONStorage(() => storage ?? memoryStorage()),
        partialize: (state) => ({ items: state.items }),
        merge: (persisted, current) => ({ ...current, items: restoreItems(persisted) }),
      },
    ),
  );
}

/** localStorage when the platform has a usable one (web), else null (memory only). */
export function defaultQueueStorage(): StateStorage | null {
  try {
    const storage = (globalThis as { localStorage?: Storage }).localStorage;
    if (!storage) return null;
    const probe = `${QUEUE_STORAGE_KEY}:probe`;
    storage.setItem(probe, '1');
    storage.removeItem(probe);
    return storage;
  } catch {
    // Private browsing modes and disabled storage throw on access.
    return null;
  }
}

/** The items of one version, in queue order. */
export function itemsOf(items: readonly QueuedItem[], designId: number, version: number): QueuedItem[] {
  return items.filter((i) => i.designId === designId && i.version === version);
}

/** The request body of an item (docs/api.md: POST …/build/marks or …/build/steps). */
export function requestOf(item: QueuedItem): { path: string; body: Record<string, unknown> } {
  const base = `/api/designs/${item.designId}/versions/${item.version}/build`;
  return item.kind === 'mark'
    ? { path: `${base}/marks`, body: { ...item.fields, clientId: item.clientId } }
    : { path: `${base}/steps`, body: { ...item.fields, clientId: item.clientId } };
}
