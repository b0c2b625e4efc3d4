import { UniqueConstraintError } from 'sequelize';
import { makeTestApp, signInAs, type TestApp } from './helpers/app';
import { designId, harborV2 } from './helpers/designs';

let t: TestApp;
let id: number;
beforeEach(async () => {
  t = await makeTestApp();
  id = await designId(t);
});
afterEach(() => t.close());

describe('saved versions and review events never change', () => {
  it('has no route that changes or deletes a version', async () => {
    const maya = await signInAs(t.app, 'admin');
    for (const method of ['put', 'patch', 'delete'] as const) {
      const res = await maya[method](`/api/designs/${id}/versions/1`).send({ message: 'rewritten' });
      // RFC 9110 §15.5.5: 404 — there is no such resource to act on at this method.
      expect([method, res.status]).toEqual([method, 404]);
    }
    const v1 = await t.models.DesignVersion.findOne({ where: { designId: id, number: 1 } });
    expect(v1?.message).toMatch(/^First layout/);
  });

  it('refuses UPDATE and DELETE in the database itself, for versions and review events', async () => {
    for (const sql of [
      "UPDATE design_versions SET message = 'rewritten'",
      'DELETE FROM design_versions',
      "UPDATE review_events SET comment = 'never said'",
      'DELETE FROM review_events',
    ]) {
      // The trigger's RAISE(ABORT) reaches Sequelize as a constraint error carrying SQLite's message.
      await expect(t.sequelize.query(sql)).rejects.toMatchObject({ parent: { message: expect.stringMatching(/rows are immutable/) } });
    }
    expect(await t.models.DesignVersion.count()).toBe(3);
    expect(await t.models.ReviewEvent.count()).toBe(4);
  });

  it('refuses updates and deletes through the models before they reach the database', async () => {
    const v1 = await t.models.DesignVersion.findOne({ where: { designId: id, number: 1 } });
    await expect(v1?.update({ message: 'rewritten' })).rejects.toThrow(/never changes/);
    await expect(t.models.DesignVersion.destroy({ where: { designId: id } })).rejects.toThrow(/never changes/);
    await expect(t.models.ReviewEvent.update({ comment: 'x' }, { where: {} })).rejects.toThrow(/never changes/);
  });

  it('keeps (design, number) unique: a second version 2 cannot be inserted', async () => {
    const v2 = await t.models.DesignVersion.findOne({ where: { designId: id, number: 2 } });
    if (!v2) throw new Error('no seeded version 2');
    const { id: _id, ...copy } = v2.get({ plain: true });
    await expect(t.models.DesignVersion.create({ ...copy, message: 'Twin' })).rejects.toBeInstanceOf(UniqueConstraintError);
  });

  it('answers a save that loses on the unique index with 409 and the real latest version, never a 500', async () => {
    const ravi = await signInAs(t.app, 'designer');
    // Make the two "latest version" reads inside the save's transaction see a stale 1, as a writer
    // that bypassed the IMMEDIATE lock would: the insert of number 2 then meets the unique index.
    const real = t.models.DesignVersion.findOne.bind(t.models.DesignVersion);
    const stale = jest
      .spyOn(t.models.DesignVersion, 'findOne')
      .mockImplementationOnce(async () => ({ number: 1 }) as never)
      .mockImplementationOnce(async () => ({ number: 1 }) as never)
      .mockImplementation(real);
    const insert = jest.spyOn(t.models.DesignVersion, 'create');
    try {
      const res = await ravi.post(`/api/designs/${id}/versions`).send({ baseVersion: 1, message: 'Stale', document: { ...harborV2() } });
      // RFC 9110 §15.5.10: 409 Conflict.
      expect(res.status).toBe(409);
      expect(res.body.latestVersion).toBe(2);
      // The base check passed on the stale read, so the insert ran and the unique index refused it.
      expect(insert).toHaveBeenCalledTimes(1);
      await expect(insert.mock.results[0].value).rejects.toBeInstanceOf(UniqueConstraintError);
    } finally {
      stale.mockRestore();
      insert.mockRestore();
    }
    expect(await t.models.DesignVersion.count({ where: { designId: id } })).toBe(2);
  });
});
