import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { ownValue } from '@/shared/keys/record';
import { DEMO, makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { buildPath, markCable, markStep, newClientId } from './helpers/build';
import { designId, mailbox, saveAndSubmit } from './helpers/designs';

/**
 * The build record of the demo's approved Harbor Road v2 (28 cables): marks, their replay by
 * clientId, the current state and progress, the history, immutability, supersession and completion.
 */
let t: TestApp;
let id: number;
let ines: Agent;
let maya: Agent;
beforeEach(async () => {
  t = await makeTestApp();
  id = await designId(t);
  [ines, maya] = await Promise.all([signInAs(t.app, 'installer'), signInAs(t.app, 'admin')]);
});
afterEach(() => t.close());

const record = async (agent: Agent = ines, n = 2) => (await agent.get(buildPath(id, n)).expect(200)).body.build;
const checklist = async (n = 2) => (await ines.get(buildPath(id, n, '/checklist')).expect(200)).body.checklist as Array<{ id: string; kind: string }>;
const history = async (n = 2) => (await ines.get(buildPath(id, n, '/history')).expect(200)).body.marks as Array<Record<string, unknown>>;
const CABLES = harborRoadV2().cables.map((c) => c.id);

describe('cable marks', () => {
  it('stores one mark for a clientId sent twice: 201, then 200 with the same mark', async () => {
    const clientId = newClientId();
    const first = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run', clientId });
    expect(first.status).toBe(201); // RFC 9110 §15.3.2
    const again = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run', clientId: clientId.toUpperCase() });
    expect(again.status).toBe(200); // RFC 9110 §15.3.1
    expect(again.body.mark).toEqual(first.body.mark);
    expect(first.body.mark).toMatchObject({ cableId: 'cable-a-01', state: 'run', note: null, by: { name: 'Ines Duarte' }, clientId });
    expect(await t.models.BuildMark.count()).toBe(1);
    const other = await markCable(ines, id, 2, { cableId: 'cable-a-02', state: 'run', clientId });
    expect(other.status).toBe(409);
    expect(other.body.error).toMatch(/already used for a different mark/);
    expect(await t.models.BuildMark.count()).toBe(1);
  });

  it('answers a replay that loses on the unique (version, clientId) index with the stored mark, never a 500', async () => {
    const clientId = newClientId();
    const first = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run', clientId }).expect(201);
    // As a second server process would: its look finds nothing, then its insert meets the index.
    const real = t.models.BuildMark.findOne.bind(t.models.BuildMark);
    const stale = jest.spyOn(t.models.BuildMark, 'findOne').mockImplementationOnce(async () => null).mockImplementation(real);
    try {
      const again = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run', clientId });
      expect(again.status).toBe(200);
      expect(again.body.mark.id).toBe(first.body.mark.id);
    } finally {
      stale.mockRestore();
    }
    expect(await t.models.BuildMark.count()).toBe(1);
  });

  it('refuses a problem without a note, with the field path', async () => {
    for (const note of [undefined, '', '   ']) {
      const res = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'problem', ...(note === undefined ? {} : { note }) });
      expect(res.status).toBe(400);
      expect(res.body.issues).toEqual([{ path: 'note', message: 'Say what the problem is, so the next person knows what to fix' }]);
    }
    const noted = await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'problem', note: '  Port p1 on fab-a has a bent pin  ' });
    expect(noted.status).toBe(201);
    expect(noted.body.mark.note).toBe('Port p1 on fab-a has a bent pin');
    expect(await t.models.BuildMark.count()).toBe(1);
  });

  it('answers 400 with paths for a cable the version does not have, a bad state, a bad clientId and unknown fields', async () => {
    const unknown = await markCable(ines, id, 2, { cableId: 'cable-z-99', state: 'run' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.issues).toEqual([{ path: 'cableId', message: 'Version 2 has no cable "cable-z-99"' }]);
    const proto = await markCable(ines, id, 2, { cableId: '__proto__', state: 'run' });
    expect(proto.status).toBe(400);
    const bad = await ines.post(buildPath(id, 2, '/marks')).send({ cableId: 'cable-a-01', state: 'done', clientId: 'phone-1', extra: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['', 'clientId', 'state']);
    expect(await t.models.BuildMark.count()).toBe(0);
  });

  it('shows the latest mark as the current state, keeps both installers’ marks and names both in the history', async () => {
    await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run' }).expect(201);
    await markCable(maya, id, 2, { cableId: 'cable-a-01', state: 'tested' }).expect(201);
    await markCable(ines, id, 2, { cableId: 'cable-a-02', state: 'run' }).expect(201);
    const build = await record();
    expect(ownValue(build.cables, 'cable-a-01')).toMatchObject({ state: 'tested', by: { name: 'Maya Okafor' } });
    expect(ownValue(build.cables, 'cable-a-02')).toMatchObject({ state: 'run', by: { name: 'Ines Duarte' } });
    expect(ownValue(build.cables, 'cable-a-03')).toEqual({ state: 'not-started', note: null, by: null, at: null });
    expect(Object.keys(build.cables).sort()).toEqual([...CABLES].sort());
    // Done means tested: a cable that is run but untested is still work to do.
    expect(build.progress.cables).toEqual({ done: 1, total: 28 });
    expect(build.progress.states).toEqual({ 'not-started': 26, run: 1, tested: 1, problem: 0 });
    const marks = await history();
    expect(marks.filter((m) => m.cableId === 'cable-a-01').map((m) => [m.state, (m.by as { name: string }).name])).toEqual([
      ['run', 'Ines Duarte'],
      ['tested', 'Maya Okafor'],
    ]);
  });

  it('gives progress per rack: a cable between racks counts in both', async () => {
    const build = await record();
    // Counted by hand from docs/demo.md's room: A01 holds vault-1, fab-a, oob-1, wms-db-1, wms-app-1 and cam-rec-1;
    // A02 fab-b, wms-db-2, wms-app-2 and cam-rec-2. A01: the array's 10 cables, its hosts' 9, and the A02 hosts'
    // cables to fab-a and oob-1 (6) = 25. A02: the array's 4 to fab-b, the A01 hosts' 3 to fab-b, its hosts' 9 = 16.
    expect(build.progress.racks.map((r: { rack: string; cables: { total: number } }) => [r.rack, r.cables.total])).toEqual([
      ['A01', 25],
      ['A02', 16],
    ]);
    expect(build.progress.steps.total).toBe((await checklist()).length);
    expect(Object.keys(build.steps)).toEqual((await checklist()).map((s) => s.id));
  });
});

describe('step marks', () => {
  it('marks a checklist step done with a note, once per clientId, and refuses steps the checklist does not have', async () => {
    const [first] = await checklist();
    const clientId = newClientId();
    const done = await markStep(ines, id, 2, { stepId: first.id, done: true, note: 'Briefed Ines and Sam', clientId });
    expect(done.status).toBe(201);
    expect((await markStep(ines, id, 2, { stepId: first.id, done: true, note: 'Briefed Ines and Sam', clientId })).status).toBe(200);
    expect(await t.models.BuildStepMark.count()).toBe(1);
    expect(ownValue((await record()).steps, first.id)).toMatchObject({ done: true, note: 'Briefed Ines and Sam', by: { name: 'Ines Duarte' } });
    const unknown = await markStep(ines, id, 2, { stepId: '["login","no-such-host"]', done: true });
    expect(unknown.status).toBe(400);
    expect(unknown.body.issues[0].path).toBe('stepId');
    const notBoolean = await ines.post(buildPath(id, 2, '/steps')).send({ stepId: first.id, done: 'yes', clientId: newClientId() });
    expect(notBoolean.status).toBe(400);
    expect(notBoolean.body.issues[0].path).toBe('done');
  });
});

describe('the history', () => {
  it('grows and never shrinks: oldest first, every earlier entry unchanged', async () => {
    let before: Array<Record<string, unknown>> = [];
    for (const [i, state] of ['run', 'problem', 'run', 'tested'].entries()) {
      await markCable(ines, id, 2, { cableId: 'cable-b-01', state, note: state === 'problem' ? 'Loose latch' : undefined }).expect(201);
      if (i === 1) await markStep(ines, id, 2, { stepId: '["safety","briefing"]', done: true }).expect(201);
      const now = await history();
      expect(now.length).toBeGreaterThan(before.length);
      expect(now.slice(0, before.length)).toEqual(before);
      before = now;
    }
    expect(before.map((m) => (m.kind === 'cable' ? m.state : 'step'))).toEqual(['run', 'problem', 'step', 'run', 'tested']);
    const times = before.map((m) => Date.parse(m.at as string));
    expect([...times].sort((a, b) => a - b)).toEqual(times);
  });

  it('cannot be changed or deleted in the database itself, nor through the models', async () => {
    await markCable(ines, id, 2, { cableId: 'cable-b-01', state: 'problem', note: 'Loose latch' }).expect(201);
    await markStep(ines, id, 2, { stepId: '["safety","briefing"]', done: true }).expect(201);
    // Row triggers fire on rows: give the photo and completion tables one each (inserting is allowed).
    const [row] = await t.models.BuildMark.findAll();
    const where = { designId: row.designId, versionId: row.versionId, versionNumber: 2, createdAt: new Date() };
    await t.models.BuildPhoto.create({ ...where, id: newClientId(), cableId: 'cable-b-01', rackId: null, authorId: row.authorId, contentType: 'image/png', bytes: 1, storedName: `${'0'.repeat(32)}.png` });
    await t.models.BuildCompletion.create({ ...where, completedById: row.authorId });
    for (const table of ['build_marks', 'build_step_marks', 'build_photos', 'build_completions']) {
      for (const sql of [`UPDATE ${table} SET createdAt = createdAt`, `DELETE FROM ${table}`]) {
        // The triggers' RAISE(ABORT) reaches Sequelize with SQLite's message (migration 0010).
        await expect(t.sequelize.query(sql)).rejects.toMatchObject({ parent: { message: expect.stringContaining(`${table} rows are immutable`) } });
      }
    }
    const [mark] = await t.models.BuildMark.findAll();
    await expect(mark.update({ note: 'nothing wrong' })).rejects.toThrow(/never changes/);
    await expect(t.models.BuildStepMark.destroy({ where: {} })).rejects.toThrow(/never changes/);
    expect(await t.models.BuildMark.count()).toBe(1);
    expect((await history()).length).toBe(2);
  });
});

describe('a version superseded by a newer approval', () => {
  it('says so on its record, and still takes marks so that nothing queued on a phone is lost', async () => {
    const ravi = await signInAs(t.app, 'designer');
    const theo = await signInAs(t.app, 'reviewer');
    expect((await record()).supersededBy).toBeNull();
    const n = await saveAndSubmit(ravi, id);
    expect((await record()).supersededBy).toBeNull(); // in review is not approved
    await theo.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'approve' }).expect(200);
    const old = await record();
    expect(old.supersededBy).toEqual({ number: n, approvedAt: expect.any(String) });
    expect(old.accepting).toBe(true);
    expect((await record(ines, n)).supersededBy).toBeNull();
    await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'run' }).expect(201);
  });
});

describe('completion', () => {
  async function finishEverything(agent: Agent): Promise<void> {
    const steps = await checklist();
    for (const cableId of CABLES) await markCable(agent, id, 2, { cableId, state: 'tested' }).expect(201);
    for (const step of steps) await markStep(agent, id, 2, { stepId: step.id, done: true, note: step.kind === 'shelves' ? 'none' : undefined }).expect(201);
  }
  const built = async () => (await mailbox(maya)).filter((m) => m.subject === 'Built: Harbor Road storage, version 2');

  // About a hundred marks, one request each.
  jest.setTimeout(60_000);

  it('is complete when every cable is tested and every step done, and tells the author and the approving reviewer once', async () => {
    await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'problem', note: 'Wrong length, replaced' }).expect(201);
    await finishEverything(ines);
    const build = await record();
    expect(build.complete).toBe(true);
    expect(build.completedAt).toEqual(expect.any(String));
    expect(build.progress.cables).toEqual({ done: 28, total: 28 });
    const first = await built();
    expect(first.map((m) => m.to[0]).sort()).toEqual([DEMO.designer, DEMO.reviewer].sort());
    expect(first[0].text).toContain('The build of version 2 of "Harbor Road storage" (Harbor Road server room) is complete');
    expect(first[0].text).toContain('Ines Duarte made the last mark.');
    expect(first[0].text).toContain('28 cables tested');
    expect(first[0].text).toContain('1 problem was noted and resolved');
    expect(first[0].text).toContain(`http://localhost:8090/designs/${id}/versions/2`);

    // Undone and done again: the record is complete again, but the e-mail went out once.
    await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'problem', note: 'Knocked out by the door' }).expect(201);
    expect((await record()).complete).toBe(false);
    await markCable(ines, id, 2, { cableId: 'cable-a-01', state: 'tested' }).expect(201);
    expect((await record()).complete).toBe(true);
    expect(await built()).toHaveLength(2);
    expect(await t.models.BuildCompletion.count()).toBe(1);
  });

  it('is not complete while a single step is open', async () => {
    const steps = await checklist();
    for (const cableId of CABLES) await markCable(ines, id, 2, { cableId, state: 'tested' }).expect(201);
    for (const step of steps.slice(1)) await markStep(ines, id, 2, { stepId: step.id, done: true }).expect(201);
    const after = await record();
    expect(after.complete).toBe(false);
    expect(after.progress.steps).toEqual({ done: steps.length - 1, total: steps.length });
    expect(await built()).toHaveLength(0);
  });
});
