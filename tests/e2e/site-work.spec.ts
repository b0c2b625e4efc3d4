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

  // The login steps are far down the list: show only the open steps of the hosts by scrolling to each.
  const logins = page.locator('[data-testid^="step-login-"][data-testid$="-sessions"]');
  const seen = new Map<string, number>();
  for (let round = 0; round < 40 && seen.size < planned.size; round++) {
    for (const sessions of await logins.all()) {
      const row = page.getByTestId((await sessions.getAttribute('data-testid'))!.replace(/-sessions$/, ''));
      const title = (await row.getByRole('heading').or(row.locator('div').first()).first().innerText()).split('\n')[0];
      const host = /^Log (.+) in:/.exec(title)?.[1];
      if (host) seen.set(host, Number(await sessions.innerText()));
    }
    await page.getByTestId('checklist-screen').evaluate((el) => {
      const scroller = (el.querySelector('[data-testid="checklist-screen"] > div') as HTMLElement | null) ?? el;
      (scroller.scrollHeight > scroller.clientHeight ? scroller : el).scrollBy(0, 800);
    });
    await page.waitForTimeout(100);
  }
  // The stored report's sessions per host (RFC 7143 sessions as the analysis plans them).
  expect(seen).toEqual(planned);
});
