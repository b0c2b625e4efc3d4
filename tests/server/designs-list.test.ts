import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { designId, harborV1, saveAndSubmit, saveOnTop } from './helpers/designs';

/**
 * GET /api/designs: a page of designs with the latest and the latest approved version of each, read
 * in a fixed number of queries however many designs and versions there are; `?limit=` and
 * `?cursor=` page through the list, most recently changed first.
 */
let t: TestApp;
let ravi: Agent;
beforeEach(async () => {
  t = await makeTestApp();
  ravi = await signInAs(t.app, 'designer');
});
afterEach(() => t.close());

type Item = { id: number; name: string; updatedAt: string; latestVersion: { number: number; review: string } | null; approvedVersion: { number: number; approvedAt: string } | null };

async function addDesigns(count: number): Promise<void> {
  for (let i = 0; i < count; i += 1) await ravi.post('/api/designs').send({ name: `Cold room ${i + 1}`, document: harborV1() }).expect(201);
}

/** Every design, page by page; answers the items in order and the number of pages. */
async function readAll(agent: Agent, limit: number): Promise<{ items: Item[]; pages: number; totals: number[] }> {
  const items: Item[] = [];
  const totals: number[] = [];
  let cursor: string | null = null;
  let pages = 0;
  do {
    const res = await agent.get('/api/designs').query({ limit, ...(cursor ? { cursor } : {}) }).expect(200);
    const body = res.body as { designs: Item[]; total: number; nextCursor: string | null };
    items.push(...body.designs);
    totals.push(body.total);
    cursor = body.nextCursor;
    pages += 1;
  } while (cursor && pages < 100);
  return { items, pages, totals };
}

/** How many SQL statements one request sends. */
async function queriesOf(send: () => Promise<unknown>): Promise<number> {
  let count = 0;
  const options = (t.sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  options.logging = () => {
    count += 1;
  };
  try {
    await send();
  } finally {
    options.logging = before;
  }
  return count;
}

describe('paging the designs list', () => {
  it('gives every design exactly once across pages, most recently changed first, with the total on each page', async () => {
    await addDesigns(7);
    const { items, pages, totals } = await readAll(ravi, 3);
    expect(pages).toBe(3);
    expect(items).toHaveLength(8);
    expect(new Set(items.map((d) => d.id)).size).toBe(8);
    expect(totals).toEqual([8, 8, 8]);
    const order = items.map((d) => [Date.parse(d.updatedAt), d.id]);
    const sorted = [...order].sort((a, b) => b[0] - a[0] || b[1] - a[1]);
    expect(order).toEqual(sorted);
    expect(items[0].name).toBe('Cold room 7');
  });

  it('keeps paging right when designs share the same change time', async () => {
    await addDesigns(5);
    await t.models.Design.update({ updatedAt: new Date('2026-11-20T09:00:00.000Z') }, { where: {} });
    const { items } = await readAll(ravi, 2);
    expect(items.map((d) => d.id)).toEqual([...items.map((d) => d.id)].sort((a, b) => b - a));
    expect(new Set(items.map((d) => d.id)).size).toBe(6);
  });

  it('reads a page in the same few queries whether the team has 1 design or 30 with many versions', async () => {
    // The first request after signing in also moves the session's expiry (one write); later ones do not.
    await ravi.get('/api/designs').expect(200);
    const few = await queriesOf(() => ravi.get('/api/designs').expect(200));
    await addDesigns(30);
    const id = await designId(t);
    for (let i = 0; i < 5; i += 1) expect((await saveOnTop(ravi, id, harborV1(), `Step ${i}`)).status).toBe(201);
    const many = await queriesOf(() => ravi.get('/api/designs').expect(200));
    expect(many).toBe(few);
    const searched = await queriesOf(() => ravi.get('/api/designs').query({ q: 'cold' }).expect(200));
    expect(searched).toBe(few + 1);
  });

  it('pages the matches of a search and counts them', async () => {
    await addDesigns(5);
    const first = await ravi.get('/api/designs').query({ q: 'COLD', limit: 2 }).expect(200);
    expect(first.body.total).toBe(5);
    expect(first.body.designs).toHaveLength(2);
    const second = await ravi.get('/api/designs').query({ q: 'COLD', limit: 2, cursor: first.body.nextCursor }).expect(200);
    expect(second.body.designs.map((d: Item) => d.name)).toEqual(['Cold room 3', 'Cold room 2']);
    expect((await ravi.get('/api/designs').query({ q: 'nothing like it' }).expect(200)).body).toEqual({ designs: [], nextCursor: null, total: 0 });
  });

  it('refuses a page size out of range and a made-up cursor with their query paths', async () => {
    for (const limit of ['0', '101', 'ten']) {
      const res = await ravi.get('/api/designs').query({ limit });
      expect(res.status).toBe(400);
      expect(res.body.issues.map((i: { path: string }) => i.path)).toEqual(['query.limit']);
    }
    const res = await ravi.get('/api/designs').query({ cursor: 'page-2' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ path: 'query.cursor', message: 'Use the nextCursor of the previous page' }]);
  });
});

describe('latest and approved versions', () => {
  it('names the approved version beside a newer draft, in the list and on the design', async () => {
    const id = await designId(t);
    const theo = await signInAs(t.app, 'reviewer');
    const n = await saveAndSubmit(ravi, id);
    await saveOnTop(ravi, id, harborV1(), 'A newer draft').then((res) => expect(res.status).toBe(201));
    const approvedEvent = await t.models.ReviewEvent.findOne({ where: { action: 'approve' } });
    const [listed] = (await ravi.get('/api/designs').expect(200)).body.designs;
    expect(listed.latestVersion).toMatchObject({ number: n + 1, review: 'draft' });
    expect(listed.approvedVersion).toEqual({ number: 2, approvedAt: approvedEvent!.createdAt.toISOString() });
    const { design } = (await ravi.get(`/api/designs/${id}`).expect(200)).body;
    expect(design.approvedVersion).toEqual(listed.approvedVersion);
    expect(design.latestVersion).toEqual(listed.latestVersion);

    await theo.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'approve' }).expect(200);
    const [after] = (await ravi.get('/api/designs').expect(200)).body.designs;
    expect(after.approvedVersion.number).toBe(n);
    expect(after.latestVersion.number).toBe(n + 1);
  });

  it('gives null for a design never approved, and installers only approved designs, their latest being the approved one', async () => {
    await ravi.post('/api/designs').send({ name: 'Dock 4 chillers', document: harborV1() }).expect(201);
    await ravi.post('/api/designs').send({ name: 'Empty idea' }).expect(201);
    const byName = new Map<string, Item>(((await ravi.get('/api/designs').expect(200)).body.designs as Item[]).map((d) => [d.name, d]));
    expect(byName.get('Dock 4 chillers')!.approvedVersion).toBeNull();
    expect(byName.get('Empty idea')!.latestVersion).toBeNull();

    const id = await designId(t);
    await saveOnTop(ravi, id, harborV1(), 'Draft after the approval').then((res) => expect(res.status).toBe(201));
    const ines = await signInAs(t.app, 'installer');
    const res = await ines.get('/api/designs').expect(200);
    expect(res.body.total).toBe(1);
    expect(res.body.designs).toEqual([
      expect.objectContaining({ name: 'Harbor Road storage', status: 'approved', latestVersion: expect.objectContaining({ number: 2, review: 'approved' }), approvedVersion: expect.objectContaining({ number: 2 }) }),
    ]);
  });

  it('lists only the caller’s team', async () => {
    const sam = await signInAs(t.app, 'otherTeam');
    const names = (await sam.get('/api/designs').expect(200)).body.designs.map((d: Item) => d.name);
    expect(names).toEqual(['Quayside lab array']);
  });
});
