import { expect, type Page, type TestInfo } from '@playwright/test';
import type { Role } from '@/shared/roles';

/** The demo team's accounts (docs/demo.md); every one uses the README's demo password. */
export const DEMO_PASSWORD = 'harbor-road-demo';
export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'maya@tidewater.example', name: 'Maya Okafor', role: 'admin' },
  { email: 'ravi@tidewater.example', name: 'Ravi Menon', role: 'designer' },
  { email: 'theo@tidewater.example', name: 'Theo Brandt', role: 'reviewer' },
  { email: 'ines@tidewater.example', name: 'Ines Duarte', role: 'installer' },
];
export const DEMO_TEAM = 'Tidewater Cold Storage';

export function isWide(testInfo: TestInfo): boolean {
  return testInfo.project.name === 'wide';
}

/** Fill and send the sign-in form on the page that is open now. */
export async function fillSignIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await fillSignIn(page, email, password);
  await expect(page).toHaveURL(/\/designs$/);
  await expect(page.getByTestId('designs-screen')).toBeVisible();
}

/** Screenshots go to test-results/screens/<project>-<name>.png, to be looked at after a run. */
export async function shot(page: Page, testInfo: TestInfo, name: string) {
  await page.screenshot({ path: `test-results/screens/${testInfo.project.name}-${name}.png`, fullPage: true });
}

/** The shell drawn for this project's window: tabs on the phone, a sidebar on the wide screen. */
export async function expectShell(page: Page, testInfo: TestInfo) {
  const [shown, hidden] = isWide(testInfo) ? ['nav-sidebar', 'nav-tabs'] : ['nav-tabs', 'nav-sidebar'];
  await expect(page.getByTestId(shown)).toBeVisible();
  await expect(page.getByTestId(hidden)).toHaveCount(0);
}
