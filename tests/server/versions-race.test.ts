import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV2, saveAndSubmit } from './helpers/designs';

/**
 * Concurrent writers on a FILE database (WAL, busy timeout, one connection per transaction, as in
 * production). ':memory:' would share one connection and prove nothing about SQLite's locking.
 */
let file: string;
let t: TestApp;
let ravi: Agent;
let maya: Agent;
let id: number;

beforeEach(async () => {
  file = path.join(tmpdir(), `cw-race-${process.pid}-${Date.now()}.sqlite`);
  t = await makeTestApp({ databasePath: file });
  ravi = await signInAs(t.app, 'designer');
  maya = await signInAs(t.app, 'admin');
  id = await designId(t);
});
afterEach(async () => {
  await t.close();
  for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
});

async function numbers(): Promise<number[]> {
  const rows = await t.models.DesignVersion.findAll({ where: { designId: id }, attributes: ['number'], order: [['number', 'ASC']] });
  return rows.map((r) => r.number);
}

const save = (agent: Agent, baseVersion: number, message: string) =>
  agent.post(`/api/designs/${id}/versions`).send({ baseVersion, message, document: harborV2() });

describe('two saves racing on the same base version', () => {
  it('runs on a WAL file database with a busy timeout', async () => {
    const [[mode]] = (await t.sequelize.query('PRAGMA journal_mode')) as [Array<{ journal_mode: string }>, unknown];
    expect(mode.journal_mode).toBe('wal');
    const [[timeout]] = (await t.sequelize.query('PRAGMA busy_timeout')) as [Array<Record<string, number>>, unknown];
    expect(Object.values(timeout)[0]).toBeGreaterThanOrEqual(1000);
  });

  it('lets exactly one win and answers the other 409 with the winner as latestVersion, round after round', async () => {
    for (let round = 0; round < 8; round++) {
      const base = 2 + round;
      const answers = await Promise.all([save(ravi, base, `Ravi's change ${round}`), save(maya, base, `Maya's change ${round}`)]);
      // RFC 9110 §15.3.2 201 Created for the winner, §15.5.10 409 Conflict for the loser.
      expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
      const loser = answers.find((a) => a.status === 409);
      expect(loser?.body.latestVersion).toBe(base + 1);
    }
    expect(await numbers()).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });

  it('lets one of five simultaneous savers win and leaves no gap or duplicate', async () => {
    const agents = [ravi, maya, ravi, maya, ravi];
    const answers = await Promise.all(agents.map((a, i) => save(a, 2, `Attempt ${i}`)));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409, 409, 409, 409]);
    expect(await numbers()).toEqual([1, 2, 3]);
    const winner = answers.find((a) => a.status === 201);
    const stored = await t.models.DesignVersion.findOne({ where: { designId: id, number: 3 } });
    expect(stored?.message).toBe(winner?.body.version.message);
  });

  it('decides in the database, not in one process: two app instances on the same file', async () => {
    const second = await makeTestApp({ databasePath: file });
    try {
      const other = await signInAs(second.app, 'designer');
      const answers = await Promise.all([save(ravi, 2, 'From the first server'), save(other, 2, 'From the second server')]);
      expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
      expect(await numbers()).toEqual([1, 2, 3]);
    } finally {
      await second.close();
    }
  });

  it('gives concurrent restores consecutive numbers: each one lands on top of the one before', async () => {
    const answers = await Promise.all([1, 2, 1, 2].map((n) => ravi.post(`/api/designs/${id}/versions/${n}/restore`).send({ message: `Restore ${n}` })));
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201, 201]);
    expect(answers.map((a) => a.body.version.number).sort()).toEqual([3, 4, 5, 6]);
    expect(await numbers()).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('accepts one of two reviewers deciding on the same version at once; the other gets 409', async () => {
    const n = await saveAndSubmit(ravi, id);
    const theo = await signInAs(t.app, 'reviewer');
    const answers = await Promise.all([
      theo.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'approve' }),
      maya.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'request-changes', comment: 'Wait: label the new cables first.' }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    const version = await t.models.DesignVersion.findOne({ where: { designId: id, number: n } });
    const events = await t.models.ReviewEvent.findAll({ where: { versionId: version?.id }, order: [['id', 'ASC']] });
    const winner = answers.find((a) => a.status === 200);
    // The submit, then exactly the one decision that won.
    expect(events.map((e) => e.action)).toEqual(['submit', winner?.body.review.events[1].action]);
  });

  it('stays answering under a burst of writers and readers at once: every request succeeds, numbers stay consecutive', async () => {
    const theo = await signInAs(t.app, 'reviewer');
    const writes = Array.from({ length: 8 }, (_, i) => (i % 2 ? ravi : maya).post(`/api/designs/${id}/versions/1/restore`).send({ message: `Burst ${i}` }));
    const reads = Array.from({ length: 16 }, (_, i) => [ravi, maya, theo][i % 3].get(i % 2 ? '/api/designs' : `/api/designs/${id}`));
    const answers = await Promise.all([...writes, ...reads]);
    expect(answers.slice(0, 8).map((a) => a.status)).toEqual(Array(8).fill(201));
    expect(answers.slice(8).map((a) => a.status)).toEqual(Array(16).fill(200));
    expect(await numbers()).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });
});
