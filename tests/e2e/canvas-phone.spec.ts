import { expect, test } from '@playwright/test';
import { shot, signIn } from './helpers';
import { designIdByName, openEditor } from './canvas-helpers';

test('on a phone: open the demo design, select a host, rename it in the bottom sheet, undo', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  await openEditor(page, await designIdByName(page, 'Harbor Road storage'));
  // The canvas fills the screen: no tab bar, and no side panel on a phone.
  await expect(page.getByTestId('nav-tabs')).toHaveCount(0);
  await expect(page.getByTestId('side-panels')).toHaveCount(0);
  await shot(page, testInfo, 'canvas-phone-open');

  await page.getByTestId('device-header-wms-db-1').tap();
  const sheet = page.getByTestId('sheet-inspector');
  await expect(sheet).toBeVisible();
  await expect(sheet).toContainText('Host wms-db-1');
  await sheet.getByTestId('inspector-name').fill('wms-db-primary');
  await sheet.getByTestId('inspector-name').press('Enter');
  await expect(page.getByTestId('device-header-wms-db-1')).toContainText('wms-db-primary');
  await expect(page.getByTestId('editor-status')).toContainText('Unsaved');
  await shot(page, testInfo, 'canvas-phone-renamed');

  await page.getByTestId('toolbar-undo').tap();
  await expect(page.getByTestId('device-header-wms-db-1')).toContainText('wms-db-1');
  await expect(page.getByTestId('device-header-wms-db-1')).not.toContainText('primary');
  await expect(sheet.getByTestId('inspector-name')).toHaveValue('wms-db-1');
  await expect(page.getByTestId('toolbar-redo')).toBeEnabled();
  await shot(page, testInfo, 'canvas-phone-undone');

  // Findings come up as a sheet; a tap on one selects its subjects.
  await page.getByTestId('toolbar-findings').tap();
  await expect(page.getByTestId('sheet-findings')).toBeVisible();
  await shot(page, testInfo, 'canvas-phone-findings');
});

test('on a phone: cabling tap by tap through the port lists leaves the canvas free, and the cable is confirmed with undo', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  await openEditor(page, await designIdByName(page, 'Harbor Road storage'));
  // wms-db-1 card-1 p2 and fab-a p11 are free in the demo's version 2. Fitted, ports are too small to aim at: each tap lists its device's ports.
  await page.getByTestId('port-wms-db-1.card-1.p2').tap();
  await expect(page.getByTestId('sheet-ports')).toContainText('Ports of wms-db-1');
  await page.getByTestId('port-list-wms-db-1.card-1.p2').tap();
  const strip = page.getByTestId('cabling-strip');
  await expect(strip).toContainText('Cabling from wms-db-1');
  await expect(page.getByTestId('sheet-inspector')).toHaveCount(0);
  // The strip is short: the other port is not under it, so a tap reaches the canvas.
  const [stripBox, portBox] = [await strip.boundingBox(), await page.getByTestId('port-fab-a.p11').boundingBox()];
  expect(stripBox!.height).toBeLessThan(844 / 4);
  expect(portBox!.y + portBox!.height).toBeLessThan(stripBox!.y);
  await shot(page, testInfo, 'canvas-phone-cabling');
  await page.getByTestId('port-fab-a.p11').tap();
  await expect(page.getByTestId('port-list')).toContainText('Choose where the cable from wms-db-1 card-1 p2 ends');
  await page.getByTestId('port-list-fab-a.p11').tap();
  // Made at once, with the remembered media: a short notice, no dialog and no settings sheet.
  await expect(page.getByTestId('cable-notice')).toContainText('wms-db-1 card-1 p2 → fab-a p11');
  await expect(page.getByTestId('cable-chooser')).toHaveCount(0);
  await expect(page.getByTestId('sheet-inspector')).toHaveCount(0);
  await expect(page.getByTestId('port-fab-a.p11')).toHaveAttribute('aria-label', /cabled/);
  await expect(page.getByTestId('editor-status')).toContainText('Unsaved');
  await shot(page, testInfo, 'canvas-phone-cable-notice');
  // The settings open when asked for.
  await page.getByTestId('cable-notice-settings').tap();
  await expect(page.getByTestId('sheet-inspector')).toContainText('wms-db-1 card-1 p2');

  // The port's settings are one tap away; Stop cabling ends the cable and the selection.
  await page.getByTestId('sheet-inspector-close').tap();
  await page.getByTestId('port-wms-db-1.card-2.p2').tap();
  await page.getByTestId('port-list-wms-db-1.card-2.p2').tap();
  await page.getByTestId('cabling-strip-details').tap();
  await expect(page.getByTestId('sheet-inspector')).toContainText('wms-db-1');
  await page.getByTestId('sheet-inspector-close').tap();
  await page.getByTestId('port-wms-db-1.card-2.p2').tap();
  await page.getByTestId('port-list-wms-db-1.card-2.p2').tap();
  await page.getByTestId('cabling-strip-stop').tap();
  await expect(page.getByTestId('cabling-strip')).toHaveCount(0);
  await expect(page.getByTestId('sheet-inspector')).toHaveCount(0);
});
