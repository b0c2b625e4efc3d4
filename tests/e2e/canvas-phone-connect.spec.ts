import { expect, test, type Page } from '@playwright/test';
import { shot, signIn } from './helpers';
import { analysisSettled, designIdByName, openEditor } from './canvas-helpers';
import { createVersionOneCopy, fingerTaps } from './canvas-phone-cabling';

// WCAG 2.1 SC 2.5.5: a touch target is at least 44 × 44 CSS px.
const MIN_TARGET = 44;

test('on a phone: cam-rec-2 gets its second cable through "Connect to…" in four taps, and its single point of failure goes', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  await openEditor(page, await createVersionOneCopy(page, 'Harbor Road, one cable short'));
  await analysisSettled(page);
  // Version 1: fab-a, card-1 and cable HR-A-10 each cut cam-rec-2 off (docs/demo.md's deliberate flaw).
  await expect(page.getByTestId('spof-mark-cable-a-10')).toHaveCount(1);
  await expect(page.getByTestId('device-cam-rec-2')).toHaveAttribute('aria-label', /single point of failure|sessions/);
  const finger = fingerTaps(page);

  // 1. The port on the canvas: drawn too small to aim at when the whole design is in view, so its device's ports are listed.
  await finger.tap(page.getByTestId('port-cam-rec-2.card-2.p1'));
  await expect(page.getByTestId('sheet-ports')).toBeVisible();
  await shot(page, testInfo, 'connect-1-port-list');
  // 2. The port, from the list.
  await finger.tap(page.getByTestId('port-list-cam-rec-2.card-2.p1'));
  await expect(page.getByTestId('cabling-strip')).toContainText('Cabling from cam-rec-2 card-2 p1');
  // 3. Connect to…
  await finger.tap(page.getByTestId('cabling-strip-connect'));
  const sheet = page.getByTestId('sheet-connect');
  await expect(sheet).toBeVisible();
  // The fitting ports come first: fab-b carries fabric B, this port's network; fab-a carries fabric A only.
  const groups = sheet.locator('[data-testid^="connect-group-"]');
  await expect(groups.first()).toHaveAttribute('data-testid', 'connect-group-fab-b');
  const best = page.getByTestId('connect-group-fab-b').locator('[data-testid^="connect-port-"]').first();
  await expect(best).toContainText('Fits');
  await expect(page.getByTestId('connect-group-fab-a').locator('[data-testid^="connect-port-"]').first()).toContainText('not on this network');
  await shot(page, testInfo, 'connect-3-list');
  // 4. The free fab-b port: the cable is made.
  const chosen = (await best.getAttribute('data-testid'))!.replace('connect-port-', '');
  await finger.tap(best);
  expect(finger.count).toBeLessThanOrEqual(4);

  await expect(page.getByTestId('cable-notice')).toContainText(`cam-rec-2 card-2 p1 → fab-b ${chosen.replace('fab-b.', '')}`);
  // No sheet is left over the canvas; the next tap reaches it.
  await expect(page.getByTestId('sheet-connect')).toHaveCount(0);
  await expect(page.getByTestId('sheet-inspector')).toHaveCount(0);
  await expect(page.getByTestId('cabling-strip')).toHaveCount(0);
  await expect(page.getByTestId(`port-${chosen}`)).toHaveAttribute('aria-label', /cabled/);
  await analysisSettled(page);
  await expect(page.getByTestId('spof-mark-cable-a-10')).toHaveCount(0);
  await expect(page.locator('[data-testid^="spof-mark-"]')).toHaveCount(0);
  await expect(page.getByTestId('editor-status')).toContainText('Unsaved');
  await shot(page, testInfo, 'connect-4-made');

  // Undo in the notice takes the cable back, and with it the single point of failure.
  await page.getByTestId('cable-notice-undo').tap();
  await expect(page.getByTestId(`port-${chosen}`)).not.toHaveAttribute('aria-label', /cabled/);
  await analysisSettled(page);
  await expect(page.getByTestId('spof-mark-cable-a-10')).toHaveCount(1);
});

/** The on-screen size of every port target drawn on the canvas, by port id. */
async function portTargets(page: Page): Promise<{ id: string; width: number; height: number }[]> {
  return page.locator('[data-testid="canvas-svg"] [data-testid^="port-"]').evaluateAll((nodes) =>
    nodes.map((n) => {
      const r = n.getBoundingClientRect();
      return { id: n.getAttribute('data-testid')!.slice('port-'.length), width: r.width, height: r.height };
    }),
  );
}

test('on a phone: every port target is 44 × 44 CSS px on screen, or a tap on it opens the port list', async ({ page }, testInfo) => {
  await signIn(page, 'ravi@tidewater.example');
  await openEditor(page, await designIdByName(page, 'Harbor Road storage'));
  const finger = fingerTaps(page);

  // Fitted: the whole design on a 390 px screen draws every port below a finger's size…
  const fitted = await portTargets(page);
  expect(fitted.length).toBeGreaterThan(60);
  expect(fitted.filter((t) => t.width >= MIN_TARGET && t.height >= MIN_TARGET)).toEqual([]);
  // …so a tap on any of them lists its device's ports and guesses none: one port of every device, tried.
  const { designs } = await (await page.request.get('/api/designs')).json();
  const id = designs.find((d: { name: string }) => d.name === 'Harbor Road storage').id;
  const doc = (await (await page.request.get(`/api/designs/${id}/versions/2`)).json()).version.document;
  for (const device of doc.devices as { id: string; name: string }[]) {
    const port = fitted.find((t) => t.id.startsWith(`${device.id}.`))!;
    await finger.tap(page.getByTestId(`port-${port.id}`));
    await expect(page.getByTestId('sheet-ports')).toContainText(`Ports of ${device.name}`);
    await expect(page.getByTestId('cabling-strip')).toHaveCount(0); // nothing guessed
    await page.getByTestId('sheet-ports-close').tap();
  }

  // A tap on the switch brings it into view at a zoom where every port target is a finger's size; a tap on a port then starts a cable from it.
  await finger.tap(page.getByTestId('device-header-fab-b'));
  await expect(page.getByTestId('sheet-inspector')).toContainText('fab-b');
  await page.getByTestId('sheet-inspector-close').tap();
  const zoomed = await portTargets(page);
  expect(zoomed.filter((t) => t.width < MIN_TARGET || t.height < MIN_TARGET)).toEqual([]);
  const ports = page.locator('[data-testid="device-fab-b"] [data-testid^="port-"]');
  const viewport = page.viewportSize()!;
  let tapped = 0;
  for (let index = 0; index < 12 && tapped === 0; index += 1) {
    const box = (await ports.nth(index).boundingBox())!;
    if (box.x < 0 || box.x + box.width > viewport.width) continue; // off screen at this zoom
    const portId = (await ports.nth(index).getAttribute('data-testid'))!.replace('port-fab-b.', '');
    await finger.tap(ports.nth(index));
    await expect(page.getByTestId('cabling-strip')).toContainText(`Cabling from fab-b ${portId}`);
    await expect(page.getByTestId('sheet-ports')).toHaveCount(0);
    tapped += 1;
  }
  expect(tapped, 'a fab-b port on screen once the switch is shown').toBe(1);
  await shot(page, testInfo, 'connect-zoomed-port');
});
