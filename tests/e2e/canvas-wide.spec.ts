import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { shot, signIn } from './helpers';
import { analysisSettled, cablePorts, designIdByName, openEditor } from './canvas-helpers';

test('from a blank design: a host on one switch has single points of failure, the second path clears them, and the saved version opens again', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  const name = `Canvas run ${Date.now()}`;
  const created = await page.request.post('/api/designs', { data: { name } });
  expect(created.status()).toBe(201);
  const { design } = await created.json();
  await openEditor(page, design.id);
  await expect(page.getByTestId('palette')).toBeVisible();

  // An array with 2 controllers × 2 data ports, two data switches, two hosts.
  await page.getByTestId('palette-array').click();
  await page.getByTestId('palette-array-controllers-value').fill('2');
  await page.getByTestId('palette-array-ports-value').fill('2');
  await page.getByTestId('palette-add-array').click();
  await page.getByTestId('palette-data-switch').click();
  await page.getByTestId('palette-add-data-switch').click();
  await page.getByTestId('palette-add-data-switch').click();
  await page.getByTestId('palette-host').click();
  await page.getByTestId('palette-add-host').click();
  await page.getByTestId('palette-add-host').click();
  for (const id of ['array-1', 'switch-1', 'switch-2', 'host-1', 'host-2']) await expect(page.getByTestId(`device-${id}`)).toBeVisible();
  await expect(page.getByTestId('group-array-1-ctl-b')).toBeVisible();
  await expect(page.getByTestId('port-array-1-ctl-b-p2')).toBeVisible();
  await expect(page.getByTestId('port-array-1-ctl-b-p3')).toHaveCount(0);
  await page.getByTestId('toolbar-add').click();
  await page.getByTestId('toolbar-arrange').click();

  // Both switches reach both controllers; host-1 is cabled to switch-1 only.
  await cablePorts(page, 'switch-1-p1', 'array-1-ctl-a-p1');
  await cablePorts(page, 'switch-1-p2', 'array-1-ctl-b-p1');
  await cablePorts(page, 'switch-2-p1', 'array-1-ctl-a-p2');
  await cablePorts(page, 'switch-2-p2', 'array-1-ctl-b-p2');
  await cablePorts(page, 'host-1-card-1-p1', 'switch-1-p3');
  await analysisSettled(page);
  // The switch, the card and the cable each cut host-1 off alone.
  await expect(page.getByTestId('spof-mark-switch-1')).toBeVisible();
  await expect(page.getByTestId('spof-mark-host-1-card-1')).toBeVisible();
  await expect(page.getByTestId('host-badge-host-1')).toHaveAttribute('aria-label', /not redundant/);
  await page.getByTestId('side-tab-findings').click();
  await expect(page.getByTestId('finding-single-point-of-failure-0')).toContainText('host-1');
  await shot(page, testInfo, 'canvas-single-path');

  // The second path: card-2 to switch-2.
  await cablePorts(page, 'host-1-card-2-p1', 'switch-2-p3');
  await analysisSettled(page);
  await expect(page.locator('[data-testid^="spof-mark-"]')).toHaveCount(0);
  await expect(page.getByTestId('host-badge-host-1')).toHaveAttribute('aria-label', /4 sessions .*, redundant/);
  await expect(page.getByTestId('finding-single-point-of-failure-0')).toHaveCount(0);
  await shot(page, testInfo, 'canvas-two-paths');

  // Keyboard: Delete removes the selected host, Mod+Z brings it back; ? opens the help sheet.
  await page.getByTestId('device-header-host-2').click();
  await page.keyboard.press('Delete');
  await expect(page.getByTestId('device-host-2')).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('device-host-2')).toBeVisible();
  await page.keyboard.press('?');
  await expect(page.getByTestId('help-shortcut-arrange')).toContainText('Shift+A');
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('help-sheet')).toHaveCount(0);

  // Leaving with unsaved changes asks first.
  await page.getByTestId('toolbar-back').click();
  await expect(page.getByTestId('leave-prompt')).toBeVisible();
  await page.getByTestId('leave-stay').click();

  await page.getByTestId('toolbar-save').click();
  await page.getByTestId('save-message').fill('Array, two fabrics and two hosts; host-1 on both fabrics');
  await page.getByTestId('save-submit').click();
  await expect(page.getByTestId('editor-saved')).toContainText('Saved as version 1');
  await expect(page.getByTestId('editor-status')).toContainText('Saved · version 1');

  // The whole diagram as a standalone SVG file.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('toolbar-export').click()]);
  expect(download.suggestedFilename()).toMatch(/^canvas-run-\d+\.svg$/);
  const svg = readFileSync((await download.path())!, 'utf8');
  expect(svg).toContain('<svg xmlns="http://www.w3.org/2000/svg"');
  for (const device of ['array-1', 'switch-1', 'switch-2', 'host-1', 'host-2']) expect(svg).toContain(`>${device}</text>`);
  expect(svg.match(/<g id="cable-/g)).toHaveLength(6);

  await page.reload();
  await expect(page.getByTestId('canvas-svg')).toBeVisible();
  await expect(page.getByTestId('restore-prompt')).toHaveCount(0);
  await expect(page.getByTestId('editor-status')).toContainText('Saved · version 1');
  await expect(page.getByTestId('cable-cable-6')).toBeAttached();
  await expect(page.getByTestId('host-badge-host-1')).toHaveAttribute('aria-label', /, redundant/);
  const versions = (await (await page.request.get(`/api/designs/${design.id}`)).json()).versions;
  expect(versions.map((v: { number: number; message: string }) => [v.number, v.message])).toEqual([[1, 'Array, two fabrics and two hosts; host-1 on both fabrics']]);
  await shot(page, testInfo, 'canvas-reloaded');
});

test('the working copy survives a reload and is offered back', async ({ page }) => {
  await signIn(page, 'ravi@tidewater.example');
  const { design } = await (await page.request.post('/api/designs', { data: { name: `Unsaved work ${Date.now()}` } })).json();
  await openEditor(page, design.id);
  await page.getByTestId('palette-host').click();
  await page.getByTestId('palette-add-host').click();
  await expect(page.getByTestId('device-host-1')).toBeVisible();
  // A link of the app's own navigation asks first too.
  await page.getByTestId('nav-designs').click();
  await expect(page.getByTestId('leave-prompt')).toBeVisible();
  await page.getByTestId('leave-stay').click();
  await expect(page).toHaveURL(new RegExp(`/designs/${design.id}/edit$`));
  // The copy is written a moment after the last change.
  await page.waitForTimeout(800);
  await page.reload();
  await expect(page.getByTestId('restore-prompt')).toBeVisible();
  await page.getByTestId('restore-accept').click();
  await expect(page.getByTestId('device-host-1')).toBeVisible();
  await expect(page.getByTestId('editor-status')).toContainText('Unsaved');
});

test('behind the unsaved-work question the saved version is drawn, not an empty design', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  await openEditor(page, await designIdByName(page, 'Harbor Road storage'));
  await page.getByTestId('device-header-wms-db-2').click();
  await page.getByTestId('inspector-name').fill('wms-db-spare');
  await page.getByTestId('inspector-name').press('Enter');
  await expect(page.getByTestId('device-header-wms-db-2')).toContainText('wms-db-spare');
  await page.waitForTimeout(800); // the copy is written a moment after the last change
  await page.reload();
  await expect(page.getByTestId('restore-prompt')).toBeVisible();
  // The saved version 2, by name and drawing.
  await expect(page.getByTestId('editor-design-name')).toHaveText('Harbor Road storage');
  await expect(page.getByTestId('editor-status')).toContainText('Saved · version 2');
  await expect(page.getByTestId('device-header-wms-db-2')).toContainText('wms-db-2');
  await expect(page.locator('[data-testid^="device-"][aria-label]')).not.toHaveCount(0);
  await shot(page, testInfo, 'canvas-restore-prompt');
  await page.getByTestId('restore-discard').click();
  await expect(page.getByTestId('restore-prompt')).toHaveCount(0);
  await expect(page.getByTestId('device-header-wms-db-2')).toContainText('wms-db-2');
});

test('a reviewer sees the demo design read-only, without edit affordances', async ({ page }, testInfo) => {
  await signIn(page, 'theo@tidewater.example');
  const { designs } = await (await page.request.get('/api/designs')).json();
  const id = designs.find((d: { name: string }) => d.name === 'Harbor Road storage').id;
  await openEditor(page, id);
  await expect(page.getByTestId('editor-status')).toContainText('Read-only');
  for (const affordance of ['toolbar-save', 'toolbar-undo', 'toolbar-arrange', 'palette', 'toolbar-add']) await expect(page.getByTestId(affordance)).toHaveCount(0);
  await page.getByTestId('device-header-fab-a').click();
  await expect(page.getByTestId('inspector-name')).not.toBeEditable();
  await expect(page.getByTestId('inspector-delete')).toHaveCount(0);
  await shot(page, testInfo, 'canvas-read-only');
});
