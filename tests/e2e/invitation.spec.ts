import { expect, test } from '@playwright/test';
import { DEMO_TEAM, expectShell, shot, signIn } from './helpers';

test('an admin invites a reviewer, who follows the e-mailed link and lands signed in', async ({ page }, testInfo) => {
  // One address per window size: both projects share one server and its database.
  const email = `lena.${testInfo.project.name}@tidewater.example`;
  await signIn(page, 'maya@tidewater.example');

  await page.getByTestId('nav-team').click();
  await expect(page.getByTestId('team-members')).toBeVisible();
  await page.getByTestId('invite-email').fill(email);
  await page.getByTestId('invite-role-reviewer').click();
  await page.getByTestId('invite-submit').click();
  await expect(page.getByTestId('invite-sent')).toContainText(email);
  await expect(page.getByTestId('team-invitations')).toContainText(email);
  await shot(page, testInfo, 'team');
  // The screen scrolls inside the app, so bring the lists into view for a second look.
  await page.getByTestId('team-invitations').scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'team-invitations');

  await page.getByTestId('nav-mailbox').click();
  const row = page.getByTestId('mail-row').filter({ hasText: email }).first();
  await expect(row).toBeVisible();
  await shot(page, testInfo, 'mailbox');
  await row.click();
  await expect(page.getByTestId('mail-message')).toContainText(email);
  await shot(page, testInfo, 'mail-message');

  await page.getByTestId('mail-link').filter({ hasText: '/invitations/' }).first().click();
  await expect(page).toHaveURL(/\/invitations\/[^/]+$/);
  await expect(page.getByTestId('invitation-team')).toHaveText(DEMO_TEAM);
  await expect(page.getByTestId('invitation-email')).toHaveText(email);
  await expect(page.getByTestId('invitation-role')).toHaveText('Reviewer');

  await page.getByTestId('accept-name').fill('Lena Arvidsen');
  await page.getByTestId('accept-password').fill('too-short');
  await page.getByTestId('accept-submit').click();
  // 12 characters is the product's own floor for new passwords (shared/api/auth.ts).
  await expect(page.getByTestId('accept-password-error')).toContainText('12 characters');
  await shot(page, testInfo, 'accept-invitation');

  await page.getByTestId('accept-password').fill('tide-and-harbor-lights');
  await page.getByTestId('accept-submit').click();
  await expect(page).toHaveURL(/\/designs$/);
  await expect(page.getByTestId('designs-screen')).toBeVisible();
  await expectShell(page, testInfo);
  await expect(page.getByTestId('signed-in-user')).toContainText('Lena Arvidsen');
  await expect(page.getByTestId('signed-in-user')).toContainText('Reviewer');
  await expect(page.getByTestId('nav-team')).toHaveCount(0);

  const me = await page.request.get('/api/auth/me');
  expect(me.status()).toBe(200);
  expect((await me.json()).user).toMatchObject({ email, name: 'Lena Arvidsen', role: 'reviewer' });
});

test('an invitation link that does not exist says so', async ({ page }, testInfo) => {
  await page.goto('/invitations/not-a-real-token');
  await expect(page.getByTestId('invitation-unavailable')).toBeVisible();
  await shot(page, testInfo, 'invitation-unavailable');
});
