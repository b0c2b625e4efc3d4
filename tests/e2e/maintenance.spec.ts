import { expect, test, type Page } from '@playwright/test';
import { analyze } from '@/shared/analysis/analyze';
import { shot, signIn } from './helpers';
import { versionDocument } from './designs-helpers';

/** The reviewer opens the approved version 2 of the demo's Harbor Road design. */
async function openHarborRoad(page: Page): Promise<number> {
  await signIn(page, 'theo@tidewater.example');
  const row = page.locator('[data-testid^="design-"]').filter({ hasText: 'Harbor Road storage' }).first();
  await row.click();
  await expect(page.getByTestId('design-screen')).toBeVisible();
  return Number(/\/designs\/(\d+)/.exec(page.url())![1]);
}

test('the maintenance view says which hosts depend on what while fab-a is down', async ({ page }, testInfo) => {
  const id = await openHarborRoad(page);
  await page.goto(`/designs/${id}/versions/2/report`);
  const doc = await versionDocument(page.request, id, 2);
  // What the stored analysis must say, worked out here from the document by the same analysis.
  const fabA = analyze(doc, { afterOne: true }).afterOneFailure!.find((e) => e.failed === 'fab-a')!;
  expect(fabA.cutOff).toEqual([]);
  expect(fabA.exposed.length).toBe(6); // product.md: six hosts, each on fab-a and fab-b

  const view = page.getByTestId('report-maintenance');
  await expect(view).toContainText('Maintenance: taking one thing down');
  const unit = view.getByTestId('maintenance-unit-fab-a');
  await expect(unit).toContainText('Take down switch fab-a');
  await expect(unit).toContainText('6 hosts exposed');
  await view.getByTestId('maintenance-toggle-fab-a').click();
  for (const pair of fabA.exposed) {
    const host = view.getByTestId(`maintenance-host-fab-a-${pair.host}`);
    await expect(host).toContainText(`${pair.host} to vault-1`);
    // With fab-a down each host hangs on fab-b, its own second card and that card's cable.
    await expect(host).toContainText('switch fab-b');
    await expect(host).toContainText(`of ${pair.host}`);
  }
  await view.getByTestId('maintenance-hosts-fab-a').scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'maintenance-fab-a');
});
