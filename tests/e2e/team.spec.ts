import { expect, request, test, type APIRequestContext } from '@playwright/test';
import { DEMO_PASSWORD, shot, signIn } from './helpers';

/** Invite and accept through the API, so the screen under test starts with a member of our own making. */
async function addMember(baseURL: string, email: string, role: 'designer' | 'installer'): Promise<void> {
  const admin = await request.newContext({ baseURL });
  expect((await admin.post('/api/auth/sign-in', { data: { email: 'maya@tidewater.example', password: DEMO_PASSWORD } })).status()).toBe(200);
  expect((await admin.post('/api/team/invitations', { data: { email, role } })).status()).toBe(201);
  const token = await invitationToken(admin, email);
  const invitee = await request.newContext({ baseURL });
  const accepted = await invitee.post(`/api/invitations/${token}/accept`, { data: { name: 'Oskar Lindqvist', password: 'cold-aisle-checklist' } });
  expect(accepted.status()).toBe(201);
  await Promise.all([admin.dispose(), invitee.dispose()]);
}

async function invitationToken(admin: APIRequestContext, email: string): Promise<string> {
  const { messages } = await (await admin.get('/api/dev/mail')).json();
  const message = messages.find((m: { to: string[] }) => m.to.includes(email));
  const match = /\/invitations\/([A-Za-z0-9_-]+)/.exec(message?.text ?? '');
  expect(match, `an invitation link in the message to ${email}`).not.toBeNull();
  return match![1];
}

test('an admin changes a member’s role and then removes them, confirming first', async ({ page, baseURL }, testInfo) => {
  const email = `oskar.${testInfo.project.name}@tidewater.example`;
  await addMember(baseURL!, email, 'installer');
  await signIn(page, 'maya@tidewater.example');
  await page.getByTestId('nav-team').click();

  const row = page.getByTestId('team-members').locator('[data-testid^="member-"]').filter({ hasText: email }).first();
  await expect(row).toContainText('Installer');
  await row.getByRole('button', { name: 'Change role', exact: true }).click();
  await row.getByRole('radio', { name: 'Designer', exact: true }).click();
  await row.getByRole('button', { name: 'Save role', exact: true }).click();
  await expect(row.getByTestId(/-role$/)).toHaveText('Designer');

  await row.getByRole('button', { name: 'Remove', exact: true }).click();
  await expect(row.getByRole('alert')).toContainText('Remove Oskar Lindqvist from the team?');
  await row.scrollIntoViewIfNeeded();
  await shot(page, testInfo, 'team-remove-confirm');
  await row.getByRole('button', { name: 'Remove', exact: true }).click();
  await expect(page.getByTestId('team-members')).not.toContainText(email);

  const team = await (await page.request.get('/api/team')).json();
  expect(team.members.map((m: { email: string }) => m.email)).not.toContain(email);
});

test('an admin withdraws a pending invitation and its link stops working', async ({ page, baseURL }, testInfo) => {
  const email = `pia.${testInfo.project.name}@tidewater.example`;
  await signIn(page, 'maya@tidewater.example');
  await page.getByTestId('nav-team').click();
  await page.getByTestId('invite-email').fill(email);
  await page.getByTestId('invite-submit').click();
  await expect(page.getByTestId('invite-sent')).toContainText(email);
  const token = await invitationToken(page.request, email);

  const row = page.getByTestId('team-invitations').locator('[data-testid^="invitation-"]').filter({ hasText: email }).first();
  await row.getByRole('button', { name: 'Withdraw', exact: true }).click();
  await expect(row.getByRole('alert')).toContainText('Its link stops working');
  await row.getByRole('button', { name: 'Withdraw', exact: true }).click();
  await expect(page.getByTestId('team-invitations')).not.toContainText(email);

  const anonymous = await request.newContext({ baseURL });
  expect((await anonymous.get(`/api/invitations/${token}`)).status()).toBe(404);
  await anonymous.dispose();
});
