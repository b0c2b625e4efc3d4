import { expect, type Page } from '@playwright/test';

/** Canvas steps shared by the canvas specs; everything is found by test id. */
export async function openEditor(page: Page, designId: number) {
  await page.goto(`/designs/${designId}/edit`);
  await expect(page.getByTestId('editor-screen')).toBeVisible();
  await expect(page.getByTestId('canvas-svg')).toBeVisible();
}

export async function designIdByName(page: Page, name: string): Promise<number> {
  const { designs } = await (await page.request.get('/api/designs')).json();
  const design = designs.find((d: { name: string }) => d.name === name);
  expect(design, `a design called ${name}`).toBeTruthy();
  return design.id;
}

/** Tap a port, tap another, accept the chooser's media and length. */
export async function cablePorts(page: Page, a: string, b: string) {
  await page.getByTestId(`port-${a}`).click();
  await page.getByTestId(`port-${b}`).click();
  await expect(page.getByTestId('cable-chooser')).toBeVisible();
  await page.getByTestId('cable-chooser-confirm').click();
  await expect(page.getByTestId('cable-chooser')).toHaveCount(0);
}

/** The live analysis has caught up with the last edit (it waits for a pause after each change). */
export async function analysisSettled(page: Page) {
  await expect(page.getByTestId('editor-status')).not.toContainText('updating');
  await page.waitForTimeout(400);
}
