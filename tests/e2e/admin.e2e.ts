import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';
import { waitForMail } from '../support/mail';

// An admin invites a colleague; the link goes only by mail; the colleague is welcomed by name with
// the e-mail filled in; role changes and deactivation are confirmed.
test('invite by mail, welcome by name, confirmed role change and deactivation', async ({ page, browser }) => {
  const stamp = Date.now().toString(36);
  const email = `wren-${stamp}@kh.example`;
  const name = `Wren Calloway ${stamp.toUpperCase()}`;
  await signInThroughForm(page, DEMO.admin);
  await page.goto('/admin/users');
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('checkbox', { name: 'Line technician' }).first().check();
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByRole('status')).toContainText(`Invitation sent to ${email}`);
  await expect(page.getByTestId('invite-link')).toHaveCount(0);

  const [mail] = await waitForMail((m) => m.to.some((t) => t.address === email));
  const link = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/.exec(mail.text)![0];
  const guest = await browser.newPage();
  await guest.goto(new URL(link).pathname);
  await guest.getByLabel('Your name').fill(name);
  await guest.getByLabel('Password (12+ characters)').fill('a-long-new-password-1');
  await guest.getByLabel('Repeat password').fill('a-long-new-password-1');
  await guest.getByRole('button', { name: 'Create my account' }).click();
  await expect(guest.getByTestId('welcome')).toContainText(`Welcome, ${name}.`);
  await expect(guest.getByLabel('E-mail')).toHaveValue(email);
  // The welcome is shown once: a reload no longer carries the name.
  await guest.reload();
  await expect(guest.getByTestId('welcome')).not.toContainText('Wren');

  await page.goto('/admin/users');
  const row = page.getByRole('row', { name: new RegExp(name) });
  await row.getByRole('checkbox', { name: 'Quality' }).check();
  await row.getByRole('button', { name: 'Save roles' }).click();
  await expect(page.getByTestId('admin-done')).toHaveText(`Roles of ${name} saved: Line technician, Quality.`);

  await row.getByRole('button', { name: 'Deactivate' }).click();
  await expect(row.getByTestId('deactivate-confirm')).toContainText('see only "Sign-in failed"');
  await row.getByRole('button', { name: 'Cancel' }).click();
  await expect(row.getByText('active', { exact: true })).toBeVisible();
  await row.getByRole('button', { name: 'Deactivate' }).click();
  await row.getByRole('button', { name: `Deactivate ${name}` }).click();
  await expect(page.getByTestId('admin-done')).toContainText(`${name} is deactivated`);
  await expect(row.getByText('deactivated', { exact: true })).toBeVisible();
  await guest.close();
});
