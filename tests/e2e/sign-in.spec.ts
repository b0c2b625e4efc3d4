import { expect, request, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_TEAM, expectShell, fillSignIn, shot, signIn } from './helpers';

test.describe('signing in', () => {
  for (const account of DEMO_ACCOUNTS) {
    test(`the ${account.role} signs in and sees the shell for this window`, async ({ page }, testInfo) => {
      await page.goto('/');
      await expect(page).toHaveURL(/\/sign-in/);
      await fillSignIn(page, account.email);
      await expect(page).toHaveURL(/\/designs$/);
      await expect(page.getByTestId('designs-screen')).toBeVisible();
      await expectShell(page, testInfo);
      await expect(page.getByTestId('team-name')).toHaveText(DEMO_TEAM);
      await expect(page.getByTestId('signed-in-user')).toContainText(account.name);
      // Team and Mailbox are for admins only (docs/api.md role table).
      const adminOnly = account.role === 'admin' ? 1 : 0;
      await expect(page.getByTestId('nav-team')).toHaveCount(adminOnly);
      await expect(page.getByTestId('nav-mailbox')).toHaveCount(adminOnly);
      await shot(page, testInfo, `designs-${account.role}`);
    });
  }

  test('a wrong password shows the inline error and stays on sign-in', async ({ page }, testInfo) => {
    await page.goto('/sign-in');
    await shot(page, testInfo, 'sign-in');
    await fillSignIn(page, 'maya@tidewater.example', 'not-the-demo-password');
    await expect(page.getByTestId('sign-in-error')).toBeVisible();
    await expect(page.getByTestId('sign-in-error')).not.toBeEmpty();
    await expect(page).toHaveURL(/\/sign-in/);
    await shot(page, testInfo, 'sign-in-wrong-password');
  });

  test('empty fields get an inline error each, without asking the server', async ({ page }) => {
    let signInCalls = 0;
    page.on('request', (r) => { if (r.url().endsWith('/api/auth/sign-in')) signInCalls++; });
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-submit').click();
    await expect(page.getByTestId('sign-in-email-error')).toBeVisible();
    await expect(page.getByTestId('sign-in-password-error')).toBeVisible();
    expect(signInCalls).toBe(0);
  });

  test('signing out returns to sign-in and the old session cookie is refused', async ({ page, context, baseURL }, testInfo) => {
    await signIn(page, 'ravi@tidewater.example');
    const cookies = await context.cookies();
    expect(cookies.length).toBeGreaterThan(0);
    const cookieHeader = cookies.map((c) => `${c.name}=${c.value}`).join('; ');

    await page.getByTestId('nav-account').click();
    await expect(page.getByTestId('account-email')).toHaveText('ravi@tidewater.example');
    await shot(page, testInfo, 'account');
    await page.getByTestId('sign-out').click();
    await expect(page).toHaveURL(/\/sign-in$/);
    await expect(page.getByTestId('sign-in-submit')).toBeVisible();

    const replay = await request.newContext({ baseURL, extraHTTPHeaders: { cookie: cookieHeader } });
    const me = await replay.get('/api/auth/me');
    expect(me.status()).toBe(401);
    await replay.dispose();
  });

  test('a signed-out visit to a signed-in page comes back to it after sign-in', async ({ page }) => {
    await page.goto('/team');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fteam/);
    await fillSignIn(page, 'maya@tidewater.example');
    await expect(page).toHaveURL(/\/team$/);
    await expect(page.getByTestId('team-members')).toBeVisible();
  });

  test('a signed-in visit to sign-in goes on to Designs', async ({ page }) => {
    await signIn(page, 'theo@tidewater.example');
    await page.goto('/sign-in');
    await expect(page).toHaveURL(/\/designs$/);
  });
});

test.describe('role limits in the app', () => {
  for (const path of ['/team', '/mailbox']) {
    test(`a designer opening ${path} is told it is not available for the role`, async ({ page }, testInfo) => {
      await signIn(page, 'ravi@tidewater.example');
      await page.goto(path);
      await expect(page.getByTestId('not-available')).toBeVisible();
      await expect(page.getByTestId('not-available')).toContainText('not available for your role');
      await shot(page, testInfo, `not-available${path.replace('/', '-')}`);
    });
  }

  test('an unknown address shows the not-found page', async ({ page }, testInfo) => {
    await page.goto('/no-such-page');
    await expect(page.getByTestId('not-found')).toBeVisible();
    await shot(page, testInfo, 'not-found');
  });
});
