import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { directAttach } from '@/shared/patterns';
import { validateTopology } from '@/shared/topology/validate';
import { isWide, shot, signIn } from './helpers';
import { designIdFromUrl, failUnit, hostsCutOff, selectVersion, switchUser, versionDocument } from './designs-helpers';

test('designer starts from a dual-fabric pattern, saves and submits a second version; reviewer tests and approves it; installer sees only the approved version', async ({ page }, testInfo) => {
  // Three sign-ins, an upload, a diff and two simulations: generous, so a busy machine does not fail it.
  test.setTimeout(240_000);
  const name = `Pier 4 cold rooms (${testInfo.project.name})`;

  // Designer: a dual-fabric pattern with three hosts becomes version 1.
  await signIn(page, 'ravi@tidewater.example');
  await page.getByTestId('designs-new').click();
  await expect(page.getByTestId('new-design-screen')).toBeVisible();
  await page.getByTestId('new-design-name').fill(name);
  await page.getByTestId('new-design-site').fill('Pier 4');
  await page.getByTestId('new-design-pattern-kind-dual-fabric').click();
  await page.getByTestId('new-design-hosts').fill('3');
  await expect(page.getByTestId('new-design-preview')).toContainText('3 hosts');
  await shot(page, testInfo, 'new-design-pattern');
  await page.getByTestId('new-design-submit').click();
  await expect(page.getByTestId('design-screen')).toBeVisible();
  const id = designIdFromUrl(page);
  await expect(page.getByTestId('version-1')).toContainText('First version');
  await expect(page.getByTestId('design-status')).toHaveAttribute('aria-label', 'Draft v1');

  // Download version 1, lengthen every host cable to 12 m, upload it as version 2.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('version-download').click()]);
  expect(download.suggestedFilename()).toBe(`pier-4-cold-rooms-${testInfo.project.name}-v1.json`);
  const v1 = JSON.parse(readFileSync(await download.path(), 'utf8'));
  expect(validateTopology(v1).ok).toBe(true);
  const changed = { ...v1, cables: v1.cables.map((c: { lengthM?: number }, i: number) => (i >= 4 ? { ...c, lengthM: 12 } : c)) };
  await page.getByTestId('design-upload').click();
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('upload-file-pick').click()]);
  await chooser.setFiles({ name: 'pier-4-longer-runs.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(changed)) });
  await expect(page.getByTestId('upload-file-preview')).toContainText('pier-4-longer-runs.json passes the checks');
  await page.getByTestId('upload-message').fill('Host cables measured on site: 12 m runs');
  await shot(page, testInfo, 'upload-version');
  await page.getByTestId('upload-save').click();
  await expect(page.getByTestId('version-2')).toContainText('Host cables measured on site: 12 m runs');
  await expect(page).toHaveURL(/version=2/);

  // What changed, then submit version 2.
  await page.getByTestId('version-1-compare').click();
  await page.getByTestId('version-2-compare').click();
  await page.getByTestId('compare-open').click();
  await expect(page.getByTestId('diff-screen')).toBeVisible();
  await expect(page.getByTestId('diff-cables')).toContainText('length (m)');
  await page.goBack();
  await selectVersion(page, 2);
  await page.getByTestId('review-comment').fill('Cable lengths from the site survey');
  await page.getByTestId('review-submit').click();
  await expect(page.getByTestId('version-2-state')).toHaveText('In review');
  await expect(page.getByTestId('design-status')).toHaveAttribute('aria-label', 'In review v2');
  await shot(page, testInfo, 'submitted');

  // Reviewer: the failure report of version 2, what-if with one switch and then both.
  await switchUser(page, 'theo@tidewater.example');
  await page.getByTestId(`design-${id}`).click();
  await selectVersion(page, 2);
  await expect(page.getByTestId('review-approve')).toBeVisible();
  await page.getByTestId('version-report').click();
  await expect(page.getByTestId('report-screen')).toBeVisible();
  const doc = await versionDocument(page.request, id, 2);
  const summary = summarize(analyze(doc), doc);
  await expect(page.getByTestId('report-headline-hosts-value')).toHaveText(`${summary.redundantHosts} of ${summary.hosts}`);

  await failUnit(page, 'fab-a', 'fab-a');
  await expect(page.getByTestId('whatif-impact')).toBeVisible();
  // In a dual-fabric design one switch down cuts nobody off: check that against analyze, then see it.
  expect(hostsCutOff(doc, ['fab-a'])).toEqual([]);
  await expect(page.getByTestId('whatif-none-lost')).toBeVisible();
  await expect(page.getByTestId('report-headline-simulated')).toContainText('switch fab-a');
  await page.getByTestId('whatif-impact').scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'whatif-one-switch');

  await failUnit(page, 'fab-b', 'fab-b');
  const lost = hostsCutOff(doc, ['fab-a', 'fab-b']);
  expect(lost.length).toBe(summary.hosts);
  for (const host of lost) await expect(page.getByTestId(`whatif-lost-${host}`)).toContainText(`${host} would lose access`);
  await page.getByTestId('whatif-impact').scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'whatif-both-switches');
  await page.getByTestId('whatif-reset').click();
  await expect(page.getByTestId('whatif-impact')).toHaveCount(0);

  await page.getByTestId('report-back').click();
  await selectVersion(page, 2);
  await page.getByTestId('review-comment').fill('Both fabrics carry every host; one switch can fail. Approved.');
  await page.getByTestId('review-approve').click();
  await expect(page.getByTestId('version-2-state')).toHaveText('Approved');
  await expect(page.getByTestId('design-status')).toHaveAttribute('aria-label', 'Approved v2');
  await expect(page.getByTestId('review-thread')).toContainText('Theo Brandt approved it');
  await shot(page, testInfo, 'approved');

  // Installer: the approved version 2 is there, the draft version 1 is not.
  await switchUser(page, 'ines@tidewater.example');
  const row = page.getByTestId(`design-${id}`);
  await expect(row).toContainText(name);
  await expect(page.getByTestId(`design-${id}-latest`)).toContainText('Version 2');
  await expect(page.getByTestId('designs-new')).toHaveCount(0);
  await row.click();
  await expect(page.getByTestId('version-2')).toBeVisible();
  await expect(page.getByTestId('version-1')).toHaveCount(0);
  await expect(page.getByTestId('review-actions')).toHaveCount(0);
  await expect(page.getByTestId('design-upload')).toHaveCount(0);
  expect((await page.request.get(`/api/designs/${id}/versions/1`)).status()).toBe(404);
  await shot(page, testInfo, 'installer-design');
  await page.goto(`/designs/${id}/versions/1`);
  await expect(page.getByTestId('version-error')).toContainText('was not found');
  if (isWide(testInfo)) await expect(page.getByTestId('nav-sidebar')).toBeVisible();
});

test('a designer who tries to save on top of an old version is told someone saved a newer one', async ({ page }, testInfo) => {
  const name = `Quay shed (${testInfo.project.name})`;
  await signIn(page, 'ravi@tidewater.example');
  const created = await page.request.post('/api/designs', { data: { name, document: directAttach({ name: 'Quay shed', hosts: 2 }) } });
  expect(created.status()).toBe(201);
  const id = (await created.json()).design.id as number;
  await page.goto(`/designs/${id}`);
  await expect(page.getByTestId('version-1')).toBeVisible();
  // Someone else saves version 2 after this screen loaded.
  const doc = await versionDocument(page.request, id, 1);
  expect((await page.request.post(`/api/designs/${id}/versions`, { data: { baseVersion: 1, message: 'Saved elsewhere', document: doc } })).status()).toBe(201);

  await page.getByTestId('design-upload').click();
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('upload-file-pick').click()]);
  await chooser.setFiles({ name: 'quay-shed.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(doc)) });
  await page.getByTestId('upload-message').fill('My edit');
  await page.getByTestId('upload-save').click();
  await expect(page.getByTestId('upload-error')).toContainText('Someone saved a newer version');
  await expect(page.getByTestId('upload-error')).toContainText('Version 2 was saved since you opened this design');
  await expect(page.getByTestId('version-2')).toContainText('Saved elsewhere');
  await expect(page.getByTestId('upload-message')).toHaveValue('My edit');
  await shot(page, testInfo, 'upload-conflict');
});
