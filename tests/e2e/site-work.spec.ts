import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import jsQR from 'jsqr';
import type { HistoryEntry } from '@/shared/api/build';
import type { Report } from '@/shared/analysis/types';
import { cableDetailUrl } from '@/shared/labels/content';
import { qrMatrix, QR_QUIET_ZONE_MODULES } from '@/shared/labels/qr';
import type { ScheduleRow } from '@/shared/schedule/types';
import { shot, signIn } from './helpers';
import { versionDocument } from './designs-helpers';

/**
 * The installer on site (issue 11), on the demo's approved Harbor Road version: the checklist's
 * planned sessions against the stored report, a cable opened from its label's QR code and marked,
 * and marks made without a connection sent exactly once when it returns.
 */

/** Ines, the demo installer, opens Site work and the first approved version's checklist: its design id and number. */
async function openChecklist(page: Page): Promise<{ id: number; n: number }> {
  await signIn(page, 'ines@tidewater.example');
  await page.getByTestId('nav-site').click();
  await expect(page.getByTestId('site-home')).toBeVisible();
  const card = page.locator('[data-testid^="site-version-"]').filter({ hasText: 'Harbor Road storage' }).first();
  await expect(card.getByTestId(/site-version-\d+-cables-text/)).toContainText(/\d+ of \d+ tested/);
  await card.getByRole('link', { name: 'Open checklist' }).click();
  await expect(page).toHaveURL(/\/designs\/\d+\/versions\/\d+\/build$/);
  const [, id, n] = /\/designs\/(\d+)\/versions\/(\d+)\/build$/.exec(page.url())!;
  await expect(page.getByTestId('checklist-screen')).toBeVisible();
  return { id: Number(id), n: Number(n) };
}

async function history(request: APIRequestContext, id: number, n: number): Promise<HistoryEntry[]> {
  const response = await request.get(`/api/designs/${id}/versions/${n}/build/history`);
  expect(response.status()).toBe(200);
  return (await response.json()).marks as HistoryEntry[];
}

async function schedule(request: APIRequestContext, id: number, n: number): Promise<ScheduleRow[]> {
  const response = await request.get(`/api/designs/${id}/versions/${n}/cables`);
  expect(response.status()).toBe(200);
  return (await response.json()).cables as ScheduleRow[];
}

/** Read a QR code the way a phone's camera would: draw its modules as pixels and decode them with jsQR. */
function readQr(text: string): string {
  const { size, dark } = qrMatrix(text);
  const scale = 4;
  const side = (size + 2 * QR_QUIET_ZONE_MODULES) * scale;
  const pixels = new Uint8ClampedArray(side * side * 4).fill(255);
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      if (!dark[y * size + x]) continue;
      for (let dy = 0; dy < scale; dy++) {
        for (let dx = 0; dx < scale; dx++) {
          const at = (((y + QR_QUIET_ZONE_MODULES) * scale + dy) * side + (x + QR_QUIET_ZONE_MODULES) * scale + dx) * 4;
          pixels.fill(0, at, at + 3);
        }
      }
    }
  }
  const decoded = jsQR(pixels, side, side);
  expect(decoded).not.toBeNull();
  return decoded!.data;
}

test('the checklist opens with the safety briefing and its planned session counts match the report', async ({ page }, testInfo) => {
  const { id, n } = await openChecklist(page);
  // Issue 11: safety first, deferring to local codes and licensed practice.
  const first = page.locator('[data-testid^="step-"][data-testid$="-done"]').first();
  await expect(first).toHaveAccessibleName(/Safety briefing/);
  await expect(page.getByTestId('step-safety-0')).toContainText('local electrical and building codes');
  await expect(page.getByTestId('step-safety-0')).toContainText('licensed practice');
  await expect(page.getByTestId('phase-safety')).toBeVisible();
  await shot(page, testInfo, 'site-checklist-top');

  const reportResponse = await page.request.get(`/api/designs/${id}/versions/${n}/report`);
  expect(reportResponse.status()).toBe(200);
  const report = (await reportResponse.json()).report as Report;
  const doc = await versionDocument(page.request, id, n);
  const nameOf = new Map(doc.devices.map((d) => [d.id, d.name?.trim() || d.id]));
  const planned = new Map<string, number>();
  for (const result of report.hosts) planned.set(nameOf.get(result.host)!, (planned.get(nameOf.get(result.host)!) ?? 0) + result.sessions);
  expect([...planned.values()].some((count) => count > 0)).toBe(true);

  // The login steps are far down the list.
  const seen = new Map<string, number>();
  for (let round = 0; round < 40 && seen.size < planned.size; round++) {
    // Read the login rows drawn now in one go: the virtualised list redraws as it scrolls.
    const drawn = await page.evaluate(() =>
      Array.from(document.querySelectorAll('[data-testid^="step-login-"][data-testid$="-sessions"]')).map((sessions) => {
        const rowId = sessions.getAttribute('data-testid')!.replace(/-sessions$/, '');
        return { title: document.querySelector(`[data-testid="${rowId}-title"]`)?.textContent ?? '', sessions: sessions.textContent ?? '' };
      }),
    );
    for (const { title, sessions } of drawn) {
      const host = /^Log (.+) in:/.exec(title)?.[1];
      if (host) seen.set(host, Number(sessions));
    }
    // The checklist is a virtualised list: scroll it to draw the rows further down.
    await page.getByTestId('checklist-screen').evaluate((el) => el.scrollBy(0, 800));
    await page.waitForTimeout(100);
  }
  // The stored report's sessions per host (RFC 7143 sessions as the analysis plans them).
  expect(seen).toEqual(planned);
});

/** Sign Ines in and find the approved Harbor Road version through the API the screens use. */
async function harborRoad(page: Page): Promise<{ id: number; n: number }> {
  await signIn(page, 'ines@tidewater.example');
  const response = await page.request.get('/api/designs?q=Harbor%20Road');
  expect(response.status()).toBe(200);
  const design = (await response.json()).designs.find((d: { name: string }) => d.name === 'Harbor Road storage');
  expect(design?.approvedVersion).toBeTruthy();
  return { id: design.id as number, n: design.approvedVersion.number as number };
}

/** Cables nobody has marked yet, in schedule order (the phone and wide runs share one server). */
async function unmarked(request: APIRequestContext, id: number, n: number, count: number): Promise<ScheduleRow[]> {
  const marked = new Set((await history(request, id, n)).flatMap((m) => (m.kind === 'cable' ? [m.cableId] : [])));
  const rows = (await schedule(request, id, n)).filter((row) => !marked.has(row.id)).slice(0, count);
  expect(rows).toHaveLength(count);
  return rows;
}

const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

test('the installer opens a cable from its label\u2019s QR code, marks it run, and still sees the mark after a reload', async ({ page, baseURL }, testInfo) => {
  const { id, n } = await harborRoad(page);
  const [cable] = await unmarked(page.request, id, n, 1);
  const address = readQr(cableDetailUrl({ appUrl: baseURL!, designId: id, version: n }, cable.id));
  expect(address).toBe(`${baseURL}/designs/${id}/versions/${n}/cables/${encodeURIComponent(cable.id)}`);

  await page.goto(address);
  const panel = page.getByTestId('cable-detail-build').getByTestId('cable-marks');
  await expect(panel.getByTestId('cable-marks-state')).toHaveText('Not started');
  await expect(panel).toContainText(`On site: ${cable.label}`);
  await panel.getByTestId('cable-mark-run').click();
  await expect(panel.getByTestId('cable-marks-state')).toHaveText('Run');
  await expect(panel.getByTestId('queue-clear')).toBeVisible();
  await panel.scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'site-cable-marked');

  await page.reload();
  await expect(panel.getByTestId('cable-marks-state')).toHaveText('Run');
  await expect(panel.getByTestId('cable-marks-waiting')).toHaveCount(0);
  await expect(panel.getByTestId('cable-history-0')).toContainText('Ines Duarte');
  const marks = (await history(page.request, id, n)).filter((m) => m.kind === 'cable' && m.cableId === cable.id);
  expect(marks.map((m) => [m.kind === 'cable' ? m.state : null, m.by.name])).toEqual([['run', 'Ines Duarte']]);
});

test('marks made without a connection wait on the phone and reach the server exactly once when it returns', async ({ page, context }, testInfo) => {
  const { id, n } = await harborRoad(page);
  const cables = await unmarked(page.request, id, n, 3);
  await page.goto(`/designs/${id}/versions/${n}/build/cables`);
  // Everything the cable pages need offline is loaded first (a busy machine takes its time).
  await expect(page.getByTestId('todo-count')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole('link', { name: new RegExp(`^Cable ${escaped(cables[0].label)},`) })).toBeVisible();

  await context.setOffline(true);
  await expect(page.getByTestId('queue-offline')).toBeVisible();
  for (const cable of cables) {
    // In-app navigation only: with no connection the page cannot be loaded again.
    await page.getByRole('link', { name: new RegExp(`^Cable ${escaped(cable.label)},`) }).click();
    const panel = page.getByTestId('cable-detail-build').getByTestId('cable-marks');
    await expect(panel).toContainText(`On site: ${cable.label}`);
    await panel.getByTestId('cable-mark-tested').click();
    await expect(panel.getByTestId('cable-marks-state')).toHaveText('Tested');
    await expect(panel.getByTestId('cable-marks-waiting')).toHaveText('Waiting to send');
    await page.goBack();
    await expect(page.getByTestId('todo-screen')).toBeVisible();
  }
  await expect(page.getByTestId('todo-screen').getByTestId('queue-waiting-count')).toHaveText('3 marks waiting to send');
  await shot(page, testInfo, 'site-offline-queue');
  // Kept in the phone's storage, so a closed tab loses nothing (lib/build/queue.ts).
  const stored = await page.evaluate(() => JSON.parse(localStorage.getItem('cablewright.build-queue.v1') ?? '{}').state?.items?.length ?? 0);
  expect(stored).toBe(3);
  const ids = new Set(cables.map((c) => c.id));
  expect((await history(page.request, id, n)).filter((m) => m.kind === 'cable' && ids.has(m.cableId))).toHaveLength(0);

  await context.setOffline(false);
  await expect(page.getByTestId('todo-screen').getByTestId('queue-clear')).toBeVisible();
  const sent = async () => (await history(page.request, id, n)).filter((m): m is Extract<HistoryEntry, { kind: 'cable' }> => m.kind === 'cable' && ids.has(m.cableId));
  // In the order they were made, one mark each (the clientId makes a replay harmless, api.md).
  expect((await sent()).map((m) => [m.cableId, m.state])).toEqual(cables.map((c) => [c.id, 'tested']));

  await page.reload();
  await expect(page.getByTestId('todo-screen').getByTestId('queue-clear')).toBeVisible();
  expect(await page.evaluate(() => JSON.parse(localStorage.getItem('cablewright.build-queue.v1') ?? '{}').state?.items?.length ?? 0)).toBe(0);
  expect(await sent()).toHaveLength(3);
});

test('a photo chosen from the files is attached to the cable and shown as a thumbnail', async ({ page }) => {
  const { id, n } = await harborRoad(page);
  const [cable] = (await schedule(page.request, id, n)).slice(-1);
  await page.goto(`/designs/${id}/versions/${n}/cables/${encodeURIComponent(cable.id)}`);
  const panel = page.getByTestId('cable-detail-build').getByTestId('cable-marks');
  await expect(panel.getByTestId('cable-marks-state')).toBeVisible();
  const before = await panel.locator('[data-testid^="cable-photo-"][role="link"]').count();
  // A 1×1 PNG (PNG signature and IHDR/IDAT/IEND chunks, ISO/IEC 15948), built by hand.
  const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');
  await panel.getByTestId('cable-photo-add-file-input').setInputFiles({ name: '../../etc/rack.png', mimeType: 'image/png', buffer: png });
  const thumb = panel.getByTestId(`cable-photo-${before}`);
  await expect(thumb).toBeVisible();
  await expect(thumb).toHaveAccessibleName(/^Photo \d+ by Ines Duarte/);
  // The thumbnail really loads through the team's photo route.
  await expect.poll(() => thumb.locator('img').evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(1);
});
