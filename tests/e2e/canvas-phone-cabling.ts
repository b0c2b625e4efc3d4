import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, type Locator, type Page } from '@playwright/test';

/** The demo's version 1 (docs/demo.md): cam-rec-2 is cabled to fab-a only, so fab-a is a single point of failure for it. */
export function harborRoadV1(): unknown {
  return JSON.parse(readFileSync(join(process.cwd(), 'shared/fixtures/harbor-road-v1.json'), 'utf8'));
}

/** A design of its own holding version 1, so the shared demo design is left as it is for the other tests. */
export async function createVersionOneCopy(page: Page, name: string): Promise<number> {
  const response = await page.request.post('/api/designs', { data: { name, document: harborRoadV1(), message: 'The demo version 1, one cable short' } });
  expect(response.status()).toBe(201);
  return (await response.json()).design.id;
}

/**
 * Taps like a finger and counts the taps. Before each tap it checks that the point tapped belongs
 * to the target itself: nothing (a sheet, a notice) lies over it.
 */
export function fingerTaps(page: Page) {
  let count = 0;
  const tap = async (target: Locator) => {
    await expect(target).toBeVisible();
    const box = (await target.boundingBox())!;
    const point = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    const onTarget = await target.evaluate((el, p) => {
      const top = document.elementFromPoint(p.x, p.y);
      return !!top && (el === top || el.contains(top));
    }, point);
    expect(onTarget, 'the tap lands on its target, not on something over it').toBe(true);
    await page.touchscreen.tap(point.x, point.y);
    count += 1;
  };
  return { tap, get count() { return count; } };
}
