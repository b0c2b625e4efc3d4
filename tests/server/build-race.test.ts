import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ownValue } from '@/shared/keys/record';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { buildPath, markCable, newClientId } from './helpers/build';
import { designId } from './helpers/designs';

/**
 * Marks racing on one cable, on a FILE database (WAL, busy timeout, one connection per
 * transaction, as in production; server/db.ts queues this process's transactions).
 */
let file: string;
let t: TestApp;
let ines: Agent;
let maya: Agent;
let id: number;
beforeEach(async () => {
  file = path.join(tmpdir(), `cw-build-race-${process.pid}-${Date.now()}.sqlite`);
  t = await makeTestApp({ databasePath: file });
  [ines, maya] = await Promise.all([signInAs(t.app, 'installer'), signInAs(t.app, 'admin')]);
  id = await designId(t);
});
afterEach(async () => {
  await t.close();
  for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
});

const STATES = ['run', 'tested', 'problem', 'not-started'] as const;

describe('concurrent marks on one cable', () => {
  it('keeps all 20, in commit order, and shows the last one committed as the current state', async () => {
    const sent = Array.from({ length: 20 }, (_, i) => {
      const state = STATES[i % STATES.length];
      return { cableId: 'cable-a-01', state, note: `Mark ${i}`, clientId: newClientId() };
    });
    const answers = await Promise.all(sent.map((body, i) => markCable(i % 2 ? maya : ines, id, 2, body)));
    expect(answers.map((a) => a.status)).toEqual(sent.map(() => 201));

    const { marks } = (await ines.get(buildPath(id, 2, '/history')).expect(200)).body as { marks: Array<{ id: number; clientId: string; note: string; at: string; state: string }> };
    expect(marks).toHaveLength(20);
    expect(new Set(marks.map((m) => m.clientId))).toEqual(new Set(sent.map((s) => s.clientId)));
    // Commit order: ids strictly increasing, times never going back.
    const ids = marks.map((m) => m.id);
    expect(ids).toEqual([...ids].sort((a, b) => a - b));
    expect(new Set(ids).size).toBe(20);
    const times = marks.map((m) => Date.parse(m.at));
    expect(times).toEqual([...times].sort((a, b) => a - b));
    // Each answer is the mark stored for its request.
    for (const [i, answer] of answers.entries()) expect(answer.body.mark).toMatchObject({ clientId: sent[i].clientId, note: sent[i].note });

    const last = marks[marks.length - 1];
    const build = (await ines.get(buildPath(id, 2)).expect(200)).body.build;
    expect(ownValue(build.cables, 'cable-a-01')).toMatchObject({ state: last.state, note: last.note });
  }, 60_000);

  it('stores one mark when the same clientId arrives twenty times at once', async () => {
    const body = { cableId: 'cable-a-02', state: 'run', clientId: newClientId() };
    const answers = await Promise.all(Array.from({ length: 20 }, () => markCable(ines, id, 2, body)));
    expect(answers.map((a) => a.status).sort()).toEqual([...Array(19).fill(200), 201]);
    expect(new Set(answers.map((a) => a.body.mark.id)).size).toBe(1);
    expect(await t.models.BuildMark.count()).toBe(1);
  }, 60_000);

  it('decides in the database, not in one process: two app instances on the same file, one clientId', async () => {
    const second = await makeTestApp({ databasePath: file });
    try {
      const other = await signInAs(second.app, 'installer');
      const body = { cableId: 'cable-a-03', state: 'tested', clientId: newClientId() };
      for (let round = 0; round < 5; round++) {
        const answers = await Promise.all([markCable(ines, id, 2, { ...body, clientId: body.clientId }), markCable(other, id, 2, body)]);
        expect(answers.every((a) => a.status === 200 || a.status === 201)).toBe(true);
        expect(new Set(answers.map((a) => a.body.mark.id)).size).toBe(1);
      }
      expect(await t.models.BuildMark.count({ where: { clientId: body.clientId } })).toBe(1);
    } finally {
      await second.close();
    }
  }, 60_000);
});
