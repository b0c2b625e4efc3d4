import { expect, test } from '@playwright/test';
import type { CableSchedule } from '@/shared/schedule/types';
import { isWide, shot, signIn } from './helpers';
import { designIdFromUrl } from './designs-helpers';

/**
 * The installer on site: the approved Harbor Road version's cable schedule, a label typed into the
 * search box, the cable opened, both of its ends read off the detail; the label sheet carries a QR
 * code for each end.
 */
async function openSchedule(page: import('@playwright/test').Page) {
  await signIn(page, 'ines@tidewater.example');
  await page.locator('[data-testid^="design-"]').filter({ hasText: 'Harbor Road storage' }).first().click();
  await expect(page.getByTestId('design-screen')).toBeVisible();
  const id = designIdFromUrl(page);
  // An installer reads approved versions only; the demo approved version 2 (docs/demo.md).
  await page.goto(`/designs/${id}/versions/2`);
  await page.getByTestId('version-schedule').click();
  await expect(page.getByTestId('schedule-screen')).toBeVisible();
  const response = await page.request.get(`/api/designs/${id}/versions/2/cables`);
  expect(response.status()).toBe(200);
  return { id, schedule: (await response.json()) as CableSchedule };
}

test('an installer searches a label, opens the cable and sees both ends', async ({ page }, testInfo) => {
  const { id, schedule } = await openSchedule(page);
  // cam-rec-2's cable through its second card: the one version 2 added (docs/demo.md).
  const row = schedule.cables.find((c) => c.b.device === 'cam-rec-2' || c.a.device === 'cam-rec-2')!;
  expect(row).toBeDefined();
  await expect(page.getByTestId('schedule-count')).toHaveText(`${schedule.cables.length} cables`);
  await page.getByTestId('schedule-search').fill(row.label.toLowerCase());
  const hits = schedule.cables.filter((c) => c.label.toLowerCase().includes(row.label.toLowerCase()));
  await expect(page.getByTestId('schedule-count')).toHaveText(`${hits.length} of ${schedule.cables.length} cables`);
  await shot(page, testInfo, 'schedule-search');
  const opener = page.getByTestId(isWide(testInfo) ? `schedule-row-${row.id}` : `schedule-card-${row.id}`);
  await opener.click();
  await expect(page).toHaveURL(new RegExp(`/designs/${id}/versions/2/cables/${encodeURIComponent(row.id)}$`));
  const detail = page.getByTestId('cable-detail-screen');
  await expect(detail.getByTestId('cable-detail-label')).toHaveText(row.label);
  await expect(detail.getByTestId('cable-detail-identifier')).toHaveText(row.identifier);
  for (const [key, end] of [['a', row.a], ['b', row.b]] as const) {
    await expect(detail.getByTestId(`cable-detail-${key}-device`)).toHaveText(end.device);
    await expect(detail.getByTestId(`cable-detail-${key}-port`)).toHaveText(end.port);
    await expect(detail.getByTestId(`cable-detail-${key}-rack`)).toHaveText(end.rack ?? 'not placed');
    await expect(detail.getByTestId(`cable-detail-${key}-ru`)).toHaveText(end.ru === null ? 'not placed' : String(end.ru));
  }
  await expect(detail.getByTestId('cable-drawing')).toBeVisible();
  await expect(detail.getByTestId('cable-detail-build')).toBeAttached();
  await shot(page, testInfo, 'cable-detail');
});

test('every cable end gets a label with a QR code on the label sheet', async ({ page }, testInfo) => {
  const { schedule } = await openSchedule(page);
  await page.getByTestId('schedule-labels').click();
  await expect(page.getByTestId('label-sheet-screen')).toBeVisible();
  await expect(page.getByTestId('labels-count')).toContainText(`${2 * schedule.cables.length} labels`);
  const first = schedule.cables[0];
  await expect(page.getByTestId(`label-${first.id}-a`)).toContainText(first.label);
  await expect(page.getByTestId(`label-${first.id}-b-qr`)).toBeVisible();
  await page.getByTestId('labels-paper-letter').click();
  await page.reload();
  // The paper is a setting kept in the browser.
  await expect(page.getByTestId('labels-paper-letter')).toHaveAttribute('aria-checked', 'true');
  await shot(page, testInfo, 'label-sheet');
});
