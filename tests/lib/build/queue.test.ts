import type { StateStorage } from 'zustand/middleware';
import { uuidFromBytes } from '@/lib/build/client-id';
import { classifyFailure, createBuildQueue, QUEUE_STORAGE_KEY, QueueInputError, requestOf, restoreItems, type QueuedItem } from '@/lib/build/queue';

/** The offline queue on its own: no React, an in-memory stand-in for localStorage, a fake server. */
function memory(): StateStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v), removeItem: (k) => void data.delete(k) };
}

let counter = 0;
const ids = () => `00000000-0000-4000-8000-${String(++counter).padStart(12, '0')}`;
const INES = { designId: 1, version: 2, userId: 4 };

/** A server that stores one mark per clientId, like the real one, and can be switched off. */
function fakeServer() {
  const stored: QueuedItem[] = [];
  const seen = new Set<string>();
  let online = true;
  let refuse: ((item: QueuedItem) => { status: number; message: string } | null) | null = null;
  const send = jest.fn(async (item: QueuedItem) => {
    if (!online) throw Object.assign(new Error('Cablewright could not reach the server.'), { status: 0 });
    const refusal = refuse?.(item);
    if (refusal) throw Object.assign(new Error(refusal.message), { status: refusal.status });
    store(item);
  });
  function store(item: QueuedItem) {
    if (!seen.has(item.clientId)) stored.push(item);
    seen.add(item.clientId);
  }
  return {
    stored,
    store,
    send,
    setOnline: (value: boolean) => (online = value),
    refuseWith: (rule: typeof refuse) => (refuse = rule),
  };
}

describe('queueing marks', () => {
  it('keeps marks in the order they were made, each waiting with its own clientId', () => {
    const queue = createBuildQueue({ newId: ids });
    const a = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'run' });
    const b = queue.getState().enqueueStep(INES, { stepId: '["safety","briefing"]', done: true });
    const c = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'tested' });
    expect(queue.getState().items.map((i) => [i.kind, i.status])).toEqual([
      ['mark', 'waiting'],
      ['step', 'waiting'],
      ['mark', 'waiting'],
    ]);
    expect(new Set([a.clientId, b.clientId, c.clientId]).size).toBe(3);
    expect(requestOf(a)).toEqual({ path: '/api/designs/1/versions/2/build/marks', body: { cableId: 'cable-a-01', state: 'run', clientId: a.clientId } });
    expect(requestOf(b).path).toBe('/api/designs/1/versions/2/build/steps');
  });

  it('refuses to queue what the server would always refuse: a problem without a note', () => {
    const queue = createBuildQueue({ newId: ids });
    expect(() => queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'problem' })).toThrow(QueueInputError);
    expect(queue.getState().items).toEqual([]);
  });

  it('survives a reload: a new queue on the same storage holds the same items, a half-sent one waiting again', () => {
    const storage = memory();
    const first = createBuildQueue({ storage, newId: ids });
    const item = first.getState().enqueueMark(INES, { cableId: 'cable-a-02', state: 'run', note: 'Routed under the floor' });
    // As if the tab closed while the item was on its way.
    const saved = JSON.parse(storage.data.get(QUEUE_STORAGE_KEY)!);
    saved.state.items[0].status = 'sending';
    storage.setItem(QUEUE_STORAGE_KEY, JSON.stringify(saved));
    const reloaded = createBuildQueue({ storage, newId: ids });
    expect(reloaded.getState().items).toEqual([{ ...item, status: 'waiting' }]);
  });

  it('drops what it cannot read back instead of failing', () => {
    const storage = memory();
    storage.setItem(QUEUE_STORAGE_KEY, '{"state":{"items":[{"kind":"mark","clientId":3},null,"x"]},"version":1}');
    expect(createBuildQueue({ storage }).getState().items).toEqual([]);
    storage.setItem(QUEUE_STORAGE_KEY, 'not json');
    expect(createBuildQueue({ storage }).getState().items).toEqual([]);
    expect(restoreItems(null)).toEqual([]);
  });
});

describe('sending', () => {
  it('sends in order when the connection returns, and the server ends with each mark exactly once', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    server.setOnline(false);
    const made = ['cable-a-01', 'cable-a-02', 'cable-a-03'].map((cableId) => queue.getState().enqueueMark(INES, { cableId, state: 'run' }));
    const offline = await queue.getState().flush(server.send, INES.userId);
    expect(offline).toEqual({ sent: [], refused: [], stopped: 'offline' });
    // It stopped at the first item: nothing behind it was tried.
    expect(server.send).toHaveBeenCalledTimes(1);
    expect(queue.getState().items.map((i) => [i.status, i.error])).toEqual([
      ['waiting', 'No connection; waiting to send.'],
      ['waiting', null],
      ['waiting', null],
    ]);
    server.setOnline(true);
    const back = await queue.getState().flush(server.send, INES.userId);
    expect(back.sent).toEqual(made.map((m) => m.clientId));
    expect(server.stored.map((s) => s.clientId)).toEqual(made.map((m) => m.clientId));
    expect(queue.getState().items).toEqual([]);
  });

  it('doubles nothing when an answer is lost and the same item is sent again', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    const item = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'tested' });
    // The server stores the mark, but the answer never reaches the phone.
    server.send.mockImplementationOnce(async (sent: QueuedItem) => {
      server.store(sent);
      throw Object.assign(new Error('lost'), { status: 0 });
    });
    await queue.getState().flush(server.send, INES.userId);
    expect(queue.getState().items).toHaveLength(1);
    await queue.getState().flush(server.send, INES.userId);
    expect(server.send.mock.calls.map(([sent]) => sent.clientId)).toEqual([item.clientId, item.clientId]);
    expect(server.stored).toHaveLength(1);
    expect(queue.getState().items).toEqual([]);
  });

  it('keeps a refused item with the server’s sentence and goes on with the rest; retry and discard', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    server.refuseWith((item) => (item.kind === 'mark' && item.fields.cableId === 'cable-z-99' ? { status: 400, message: 'Version 2 has no cable "cable-z-99"' } : null));
    const bad = queue.getState().enqueueMark(INES, { cableId: 'cable-z-99', state: 'run' });
    const good = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'run' });
    const report = await queue.getState().flush(server.send, INES.userId);
    expect(report).toEqual({ sent: [good.clientId], refused: [bad.clientId], stopped: null });
    expect(queue.getState().items).toEqual([{ ...bad, status: 'refused', attempts: 1, error: 'Version 2 has no cable "cable-z-99"' }]);
    queue.getState().retry(bad.clientId);
    expect(queue.getState().items[0]).toMatchObject({ status: 'waiting', error: null });
    expect(queue.getState().discard(bad.clientId)).toBe(true);
    expect(queue.getState().items).toEqual([]);
  });

  it('stops and keeps waiting when the session ended or the server fails, so nothing overtakes', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'run' });
    queue.getState().enqueueMark(INES, { cableId: 'cable-a-02', state: 'run' });
    for (const [status, stopped] of [
      [401, 'signed-out'],
      [503, 'server'],
      [429, 'server'],
    ] as const) {
      server.refuseWith(() => ({ status, message: `HTTP ${status}` }));
      expect((await queue.getState().flush(server.send, INES.userId)).stopped).toBe(stopped);
      expect(queue.getState().items.map((i) => i.status)).toEqual(['waiting', 'waiting']);
    }
    expect(server.stored).toEqual([]);
  });

  it('runs one flush at a time: two calls at once send each item once', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    for (const cableId of ['cable-a-01', 'cable-a-02']) queue.getState().enqueueMark(INES, { cableId, state: 'run' });
    const [a, b] = await Promise.all([queue.getState().flush(server.send, INES.userId), queue.getState().flush(server.send, INES.userId)]);
    expect(a).toBe(b);
    expect(server.send).toHaveBeenCalledTimes(2);
    expect(queue.getState().flushing).toBe(false);
  });

  it('looks again when a mark is queued while a flush is finishing, so the new mark does not wait for the next one', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    const first = queue.getState().flush(server.send, INES.userId); // nothing to send yet
    const item = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'run' });
    const second = queue.getState().flush(server.send, INES.userId);
    expect(second).toBe(first);
    expect((await second).sent).toEqual([item.clientId]);
    expect(queue.getState().items).toEqual([]);
  });

  it('sends only the signed-in account’s marks; another account’s wait for them', async () => {
    const queue = createBuildQueue({ newId: ids });
    const server = fakeServer();
    const maya = queue.getState().enqueueMark({ ...INES, userId: 1 }, { cableId: 'cable-a-01', state: 'run' });
    const ines = queue.getState().enqueueMark(INES, { cableId: 'cable-a-02', state: 'run' });
    expect((await queue.getState().flush(server.send, INES.userId)).sent).toEqual([ines.clientId]);
    expect(queue.getState().items).toEqual([maya]);
  });

  it('will not discard an item while it is being sent', async () => {
    const queue = createBuildQueue({ newId: ids });
    const item = queue.getState().enqueueMark(INES, { cableId: 'cable-a-01', state: 'run' });
    let release: () => void = () => undefined;
    const flushing = queue.getState().flush(() => new Promise<void>((resolve) => (release = resolve)), INES.userId);
    expect(queue.getState().items[0].status).toBe('sending');
    expect(queue.getState().discard(item.clientId)).toBe(false);
    release();
    await flushing;
    expect(queue.getState().items).toEqual([]);
  });
});

describe('failure kinds and clientIds', () => {
  it('treats no answer as offline, 401 as signed out, 408/429/5xx as try again, other 4xx as refused', () => {
    expect(classifyFailure(new TypeError('Failed to fetch'))).toBe('offline');
    expect(classifyFailure({ status: 0 })).toBe('offline');
    expect(classifyFailure({ status: 401 })).toBe('signed-out'); // RFC 9110 §15.5.2
    expect(classifyFailure({ status: 408 })).toBe('server'); // RFC 9110 §15.5.9
    expect(classifyFailure({ status: 429 })).toBe('server'); // RFC 6585 §4
    expect(classifyFailure({ status: 502 })).toBe('server');
    for (const status of [400, 403, 404, 409, 413, 415]) expect(classifyFailure({ status })).toBe('refused');
  });

  it('builds version 4 UUIDs from random bytes when randomUUID is missing', () => {
    const uuid = uuidFromBytes(new Uint8Array(16).fill(0xff));
    // RFC 9562 §5.4: version nibble 4, variant bits 10.
    expect(uuid).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
    expect(uuidFromBytes(new Uint8Array(16))).toBe('00000000-0000-4000-8000-000000000000');
  });
});
