import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { loginPlan } from '@/shared/handover/login-plan';
import { cableSchedule } from '@/shared/schedule';
import { addressTable, ADDRESS_COLUMNS } from '@/shared/schedule/tables';
import { closeHandoverPool } from '@/server/services/handover/pool';
import { makeTestApp, signInAs, type Agent, type DemoWho, type TestApp } from './helpers/app';
import { designId, harborV1, harborV2 } from './helpers/designs';
import { ensurePoppler, pdfPagePng, pdfPages } from './helpers/poppler';

/**
 * The handover pack (api.md `GET …/handover.pdf`), read back with poppler's pdftotext — a reader
 * that is not ours. The seeded demo: Harbor Road v1 (changes asked, so not approved) and v2
 * (approved). The first page is rendered with pdftoppm and kept under tests/artefacts/ to look at.
 */
let t: TestApp;
let id: number;
const agents = new Map<DemoWho, Agent>();
const pdfs = new Map<number, Buffer>();

function binary(res: request.Response, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

async function pdfOf(n: number): Promise<Buffer> {
  const known = pdfs.get(n);
  if (known) return known;
  const res = await agents.get('designer')!.get(`/api/designs/${id}/versions/${n}/handover.pdf`).buffer(true).parse(binary).expect(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  pdfs.set(n, res.body as Buffer);
  return res.body as Buffer;
}

/** pdftotext puts each table cell on its own line (or wraps it); compare with whitespace squeezed out. */
const squeeze = (text: string) => text.replace(/\s+/g, '');

beforeAll(async () => {
  ensurePoppler();
  t = await makeTestApp();
  id = await designId(t);
  for (const who of ['designer', 'installer', 'otherTeam'] as const) agents.set(who, await signInAs(t.app, who));
}, 120_000);
afterAll(async () => {
  await closeHandoverPool();
  await t.close();
});

describe('who may read the handover pack', () => {
  it('as the version itself: installers approved versions only, another team 404, a bad number 400', async () => {
    expect((await request(t.app).get(`/api/designs/${id}/versions/2/handover.pdf`)).status).toBe(401);
    expect((await agents.get('installer')!.get(`/api/designs/${id}/versions/1/handover.pdf`)).status).toBe(404);
    expect((await agents.get('otherTeam')!.get(`/api/designs/${id}/versions/2/handover.pdf`)).status).toBe(404);
    const bad = await agents.get('designer')!.get(`/api/designs/${id}/versions/two/handover.pdf`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path)).toEqual(['params.n']);
  });
});

describe('the approved version', () => {
  it('carries every cable label, every address and the approver', async () => {
    const pdf = await pdfOf(2);
    // ISO 32000-1 §7.5.2: a PDF file begins with the header %PDF-1.n.
    expect(pdf.subarray(0, 8).toString('latin1')).toMatch(/^%PDF-1\.\d/);
    const pages = pdfPages(pdf);
    const all = squeeze(pages.join('\n'));
    const doc = harborV2();
    const labels = cableSchedule(doc).cables.map((c) => c.label);
    expect(labels.length).toBeGreaterThan(20);
    for (const label of labels) expect(all).toContain(squeeze(label));
    const at = ADDRESS_COLUMNS.indexOf('address');
    const addresses = addressTable(doc).rows.map((r) => r[at]).filter((a): a is string => typeof a === 'string' && a !== 'dhcp');
    expect(addresses.length).toBeGreaterThan(10);
    for (const address of addresses) expect(all).toContain(address);

    const detail = await agents.get('designer')!.get(`/api/designs/${id}/versions/2`).expect(200);
    const approvals = detail.body.version.review.events.filter((e: { action: string }) => e.action === 'approve');
    const approver = approvals.at(-1).actor.name as string;
    expect(pages[0]).toContain(approver);
    expect(pages[0]).toContain(approvals.at(-1).createdAt.slice(0, 10));
    for (const page of pages) expect(page).not.toMatch(/not approved/i);
  });

  it('lists the login plan: every host with its expected sessions and every portal on port 3260', async () => {
    const all = squeeze(pdfPages(await pdfOf(2)).join('\n'));
    const plan = loginPlan(harborV2());
    expect(plan.hosts.length).toBeGreaterThan(3);
    for (const host of plan.hosts) {
      expect(all).toContain(squeeze(`${host.name} · ${host.initiator ?? 'no initiator name yet'} · ${host.expectedSessions} sessions expected`));
      for (const port of host.ports) for (const target of port.targets) {
        // RFC 7143 §4.2.7.4 / IANA: the iSCSI port is TCP 3260.
        if (target.portal) expect(target.portal.endsWith(':3260')).toBe(true);
        if (target.portal) expect(all).toContain(target.portal);
      }
    }
  });

  it('numbers every page and names the version on each', async () => {
    const pages = pdfPages(await pdfOf(2));
    expect(pages.length).toBeGreaterThan(3);
    pages.forEach((page, i) => {
      expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(page).toContain('Version 2');
    });
  });

  it('names the CHAP mode but holds no secret, and keeps the safety cautions and bring-up order', async () => {
    const text = pdfPages(await pdfOf(2)).join('\n');
    expect(text).toMatch(/CHAP/);
    // IEC 60825-1 is the laser safety standard the caution cites.
    expect(text).toContain('IEC 60825-1');
    expect(text).toContain('Bring-up order');
    expect(text).toContain('Rack elevations');
  });

  it('renders its first page as an image (kept under tests/artefacts/)', async () => {
    const png = pdfPagePng(await pdfOf(2), 1, 72);
    // PNG signature, ISO/IEC 15948 §5.2.
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    // IHDR width/height (bytes 16–23): A4 is 595.28 × 841.89 pt (ISO 216), so at 72 dpi 595 or 596 × 842.
    expect(Math.abs(png.readUInt32BE(16) - 595)).toBeLessThanOrEqual(1);
    expect(Math.abs(png.readUInt32BE(20) - 842)).toBeLessThanOrEqual(1);
    const dir = path.join(__dirname, '..', 'artefacts');
    mkdirSync(dir, { recursive: true });
    writeFileSync(path.join(dir, 'handover-v2-page-1.png'), png);
    writeFileSync(path.join(dir, 'handover-v2-page-2.png'), pdfPagePng(await pdfOf(2), 2, 72));
    writeFileSync(path.join(dir, 'handover-v1-page-1.png'), pdfPagePng(await pdfOf(1), 1, 72));
  });
});

describe('a version that is not approved', () => {
  it('says "not approved" on every page and names no approver', async () => {
    const pages = pdfPages(await pdfOf(1));
    expect(pages.length).toBeGreaterThan(3);
    for (const page of pages) expect(page).toMatch(/not approved/i);
    expect(pages[0]).not.toContain('Approved by');
    // v1's own cables are there too.
    const all = squeeze(pages.join('\n'));
    for (const c of cableSchedule(harborV1()).cables) expect(all).toContain(squeeze(c.label));
  });
});
