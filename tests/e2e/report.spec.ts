import { expect, test, type Page } from '@playwright/test';
import { analyze } from '@/shared/analysis/analyze';
import { isWide, shot, signIn } from './helpers';
import { failUnit, hostsCutOff, versionDocument } from './designs-helpers';

/** The demo's Harbor Road design, found by name in the reviewer's list. */
async function openHarborRoad(page: Page): Promise<number> {
  await signIn(page, 'theo@tidewater.example');
  const row = page.locator('[data-testid^="design-"]').filter({ hasText: 'Harbor Road storage' }).first();
  await row.click();
  await expect(page.getByTestId('design-screen')).toBeVisible();
  return Number(/\/designs\/(\d+)/.exec(page.url())![1]);
}

test("the demo's flawed version 1 names cam-rec-2's single points of failure and the management port on fab-b", async ({ page }, testInfo) => {
  const id = await openHarborRoad(page);
  await page.goto(`/designs/${id}/versions/1/report`);
  const doc = await versionDocument(page.request, id, 1);
  const camRec2 = analyze(doc).hosts.find((h) => h.host === 'cam-rec-2')!;
  expect(camRec2.singlePointsOfFailure.length).toBeGreaterThan(0);

  const spofs = page.getByTestId('report-host-cam-rec-2-spofs');
  await expect(spofs).toContainText(`Single points of failure (${camRec2.singlePointsOfFailure.length})`);
  // docs/demo.md: cam-rec-2 is cabled only to fab-a, through its first card.
  await expect(spofs).toContainText('switch fab-a');
  await expect(spofs).toContainText('card-1 of cam-rec-2');
  await expect(spofs).toContainText(/cable HR-A-10 \(cam-rec-2 card-1 p1 → fab-a p\d+\)/);
  await spofs.scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'report-v1-spofs');

  const finding = page.getByTestId('report-findings-error').getByTestId('report-finding-management-port-on-data-switch');
  await expect(finding).toContainText('vault-1 ctl-b mgmt');
  await expect(finding).toContainText('fab-b');
  await finding.scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'report-v1-findings');
});

test('in version 1, failing fab-a in what-if cuts cam-rec-2 off, exactly as analyze says', async ({ page }, testInfo) => {
  const id = await openHarborRoad(page);
  await page.goto(`/designs/${id}/versions/1/report`);
  const doc = await versionDocument(page.request, id, 1);
  const lost = hostsCutOff(doc, ['fab-a']);
  expect(lost).toEqual(['cam-rec-2']);

  await failUnit(page, 'fab-a', 'fab-a');
  const impact = page.getByTestId('whatif-impact');
  await expect(impact).toContainText('Simulation — not the saved report');
  for (const host of lost) {
    await expect(page.getByTestId(`whatif-lost-${host}`)).toContainText(`${host} would lose access to vault-1`);
    await expect(page.getByTestId(`report-host-${host}-lost`)).toContainText('Would lose access');
  }
  await expect(page.getByTestId('whatif-lost').locator('[data-testid^="whatif-lost-"]')).toHaveCount(lost.length);
  await impact.scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'report-v1-whatif-fab-a');
  await page.getByTestId('whatif-impact-reset').click();
  await expect(page.getByTestId('report-headline-simulated')).toHaveCount(0);
});

test('version 2 has no single point of failure and no management port on a data switch', async ({ page }, testInfo) => {
  const id = await openHarborRoad(page);
  await page.goto(`/designs/${id}/versions/2/report`);
  const doc = await versionDocument(page.request, id, 2);
  const report = analyze(doc);
  expect(report.failures).toEqual([]);
  await expect(page.getByTestId('report-failures-none')).toBeVisible();
  await expect(page.getByTestId('report-headline-spof-value')).toHaveText('0');
  await expect(page.getByTestId('report-headline-hosts-value')).toHaveText('6 of 6');
  await expect(page.getByTestId('report-host-cam-rec-2-spofs')).toHaveCount(0);
  await expect(page.getByTestId('report-finding-management-port-on-data-switch')).toHaveCount(0);
  await expect(page.getByTestId('report-finding-single-point-of-failure')).toHaveCount(0);
  await shot(page, testInfo, 'report-v2');
});

test('the printed report leaves out the navigation and the what-if controls', async ({ page }, testInfo) => {
  const id = await openHarborRoad(page);
  await page.goto(`/designs/${id}/versions/1/report`);
  await expect(page.getByTestId('report-headline')).toBeVisible();
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByTestId(isWide(testInfo) ? 'nav-sidebar' : 'nav-tabs')).toBeHidden();
  await expect(page.getByTestId('whatif-panel')).toBeHidden();
  await expect(page.getByTestId('report-print')).toBeHidden();
  await expect(page.getByTestId('report-findings')).toBeVisible();
  await shot(page, testInfo, 'report-print');
  await page.emulateMedia({ media: 'screen' });
  await expect(page.getByTestId('whatif-panel')).toBeVisible();
});
