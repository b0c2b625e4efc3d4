import { expect, type APIRequestContext, type Page } from '@playwright/test';
import { analyze } from '@/shared/analysis/analyze';
import type { Topology } from '@/shared/topology/schema';
import { signIn } from './helpers';

/** Sign the page out (cookies gone) and in again as someone else. */
export async function switchUser(page: Page, email: string) {
  await page.context().clearCookies();
  await signIn(page, email);
}

/** The design's id from the design screen's address (/designs/12 or /designs/12?version=2). */
export function designIdFromUrl(page: Page): number {
  const match = /\/designs\/(\d+)/.exec(new URL(page.url()).pathname);
  expect(match, `a design address, got ${page.url()}`).not.toBeNull();
  return Number(match![1]);
}

/** A version's document through the API with the page's own session, as the browser would load it. */
export async function versionDocument(request: APIRequestContext, designId: number, n: number): Promise<Topology> {
  const response = await request.get(`/api/designs/${designId}/versions/${n}`);
  expect(response.status()).toBe(200);
  return (await response.json()).version.document as Topology;
}

/** Hosts that reach an array now and would reach none with `failed` down: read off analyze itself. */
export function hostsCutOff(doc: Topology, failed: string[]): string[] {
  const after = new Set(analyze(doc, { failed }).hosts.map((h) => `${h.host}>${h.array}`));
  return [...new Set(analyze(doc).hosts.filter((h) => !after.has(`${h.host}>${h.array}`)).map((h) => h.host))].sort();
}

/** Open version n on the design screen: a row tap selects it in both layouts. */
export async function selectVersion(page: Page, n: number) {
  await page.getByTestId(`version-${n}-open`).click();
  await expect(page).toHaveURL(new RegExp(`version=${n}`));
  await expect(page.getByTestId('version-panel')).toBeVisible();
}

/** Fail one unit in the what-if panel by searching for it. */
export async function failUnit(page: Page, query: string, unitId: string) {
  await page.getByTestId('whatif-search').fill(query);
  await page.getByTestId(`whatif-add-${unitId}`).click();
  await expect(page.getByTestId(`whatif-failed-${unitId}`)).toBeVisible();
}
