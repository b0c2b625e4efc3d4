import { expect, test, type Page } from '@playwright/test';
import { dualFabric } from '@/shared/patterns';
import { DEMO_PASSWORD, shot, signIn } from './helpers';
import { switchUser } from './designs-helpers';

/** Save one version on top of the latest through the API, with the page's session. */
async function save(page: Page, id: number, base: number, message: string, hosts: number) {
  const response = await page.request.post(`/api/designs/${id}/versions`, { data: { baseVersion: base, message, document: dualFabric({ name: 'Cold room annex', hosts }) } });
  expect(response.status()).toBe(201);
}

test('the designs list and the design header say “Approved v3 · draft v4” when a draft follows the approved version', async ({ page }, testInfo) => {
  const name = `Cold room annex (${testInfo.project.name})`;
  await signIn(page, 'ravi@tidewater.example');
  const created = await page.request.post('/api/designs', { data: { name, document: dualFabric({ name: 'Cold room annex', hosts: 2 }) } });
  const id = (await created.json()).design.id as number;
  await save(page, id, 1, 'Third host', 3);
  await save(page, id, 2, 'Fourth host', 4);
  expect((await page.request.post(`/api/designs/${id}/versions/3/review`, { data: { action: 'submit' } })).status()).toBe(200);
  // The reviewer approves version 3 (signed in through the API, as the sign-in form would).
  await page.context().clearCookies();
  expect((await page.request.post('/api/auth/sign-in', { data: { email: 'theo@tidewater.example', password: DEMO_PASSWORD } })).status()).toBe(200);
  expect((await page.request.post(`/api/designs/${id}/versions/3/review`, { data: { action: 'approve' } })).status()).toBe(200);
  // The designer saves version 4 after it.
  await switchUser(page, 'ravi@tidewater.example');
  await save(page, id, 3, 'Fifth host', 5);

  const { designs } = await (await page.request.get('/api/designs')).json();
  const item = designs.find((d: { id: number }) => d.id === id);
  expect(item.latestVersion.number).toBe(4);
  expect(item.approvedVersion.number).toBe(3);

  await page.goto('/designs');
  await expect(page.getByTestId(`design-${id}-status`)).toHaveAttribute('aria-label', 'Approved v3 · draft v4');
  await expect(page.getByTestId(`design-${id}-status`)).toContainText('Approved v3');
  await expect(page.getByTestId(`design-${id}-status`)).toContainText('draft v4');
  await shot(page, testInfo, 'designs-approved-and-draft');
  await page.getByTestId(`design-${id}`).click();
  await expect(page.getByTestId('design-status')).toHaveAttribute('aria-label', 'Approved v3 · draft v4');
  await shot(page, testInfo, 'design-approved-and-draft');
});
