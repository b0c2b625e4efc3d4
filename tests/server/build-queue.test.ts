import { createBuildQueue, requestOf, type QueuedItem } from '@/lib/build/queue';
import { withPending } from '@/lib/build/pending';
import { ownValue } from '@/shared/keys/record';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { buildPath } from './helpers/build';
import { designId } from './helpers/designs';

/** The phone's offline queue sending to the real routes: marks made offline arrive once each, in order. */
let t: TestApp;
let id: number;
let ines: Agent;
let inesId: number;
beforeEach(async () => {
  t = await makeTestApp();
  id = await designId(t);
  ines = await signInAs(t.app, 'installer');
  inesId = (await ines.get('/api/auth/me').expect(200)).body.user.id;
});
afterEach(() => t.close());

/** A sender over the agent, failing like the app's client: status 0 when "offline", the answer's status otherwise. */
function sender(agent: Agent, isOnline: () => boolean) {
  return async (item: QueuedItem) => {
    if (!isOnline()) throw Object.assign(new Error('no connection'), { status: 0 });
    const { path, body } = requestOf(item);
    const res = await agent.post(path).send(body);
    if (res.status >= 300) throw Object.assign(new Error(res.body.error), { status: res.status });
  };
}

describe('the offline queue against the server', () => {
  it('marks three cables offline, shows them waiting, and puts each on the server exactly once when back online', async () => {
    let online = false;
    const queue = createBuildQueue();
    const send = sender(ines, () => online);
    const target = { designId: id, version: 2, userId: inesId };
    const cables = ['cable-a-01', 'cable-a-02', 'cable-b-01'];
    for (const cableId of cables) queue.getState().enqueueMark(target, { cableId, state: 'run' });

    expect((await queue.getState().flush(send, inesId)).stopped).toBe('offline');
    const before = (await ines.get(buildPath(id, 2)).expect(200)).body.build;
    const shown = withPending(before, queue.getState().items, { id: inesId, name: 'Ines Duarte' });
    expect(cables.map((c) => [ownValue(shown.cables, c)?.state, ownValue(shown.cables, c)?.pending])).toEqual(cables.map(() => ['run', 'waiting']));
    expect(shown.waiting).toBe(3);

    online = true;
    // Sent twice over (a second flush after a lost answer would do the same): still one mark each.
    const sentItems = [...queue.getState().items];
    expect((await queue.getState().flush(send, inesId)).sent).toHaveLength(3);
    for (const item of sentItems) await send(item);
    const { marks } = (await ines.get(buildPath(id, 2, '/history')).expect(200)).body;
    expect(marks.map((m: { cableId: string }) => m.cableId)).toEqual(cables);
    expect(marks.map((m: { clientId: string }) => m.clientId)).toEqual(sentItems.map((i) => i.clientId));
    expect(queue.getState().items).toEqual([]);
  });

  it('keeps a mark the server refuses, with its sentence, and sends the rest', async () => {
    const queue = createBuildQueue();
    const target = { designId: id, version: 2, userId: inesId };
    queue.getState().enqueueMark({ ...target, version: 1 }, { cableId: 'cable-a-01', state: 'run' });
    queue.getState().enqueueMark(target, { cableId: 'cable-a-02', state: 'tested' });
    const report = await queue.getState().flush(sender(ines, () => true), inesId);
    expect(report.sent).toHaveLength(1);
    expect(queue.getState().items).toMatchObject([{ status: 'refused', error: 'This design has no version 1.' }]);
  });
});
