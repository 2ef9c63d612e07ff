import { test, expect, request } from '@playwright/test';
import { DEMO, BASE, makeUser, postSignIn, signInThroughForm, signedInContext, testDb } from './support/accounts';
import { ROLE_LABELS, type Role } from '../../src/lib/roles';
import { tokenFor } from './support/tokens';

test.describe('sign-in through the browser', () => {
  for (const role of Object.keys(DEMO) as Role[]) {
    test(`a ${role} signs in and sees the app shell for that role`, async ({ page }) => {
      await signInThroughForm(page, DEMO[role]);
      await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
      await expect(page.getByText(ROLE_LABELS[role], { exact: false }).first()).toBeVisible();
      const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
      expect(font).toContain('IBM Plex Sans');
      const hasPeople = await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).count();
      expect(hasPeople).toBe(role === 'admin' ? 1 : 0);
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.goto('/profile');
      await expect(page).toHaveURL(/\/signin/);
    });
  }

  test('a wrong password gets one generic message', async ({ page }) => {
    await page.goto('/signin');
    await page.getByLabel('E-mail').fill(DEMO.quality);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toContainText('Sign-in failed');
    await page.goto('/signin');
    await page.getByLabel('E-mail').fill('nobody@kestrelhollow.example');
    await page.getByLabel('Password').fill('whatever');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toContainText('Sign-in failed');
  });

  test('a wrong role gets the 403 page inside the app shell', async ({ page }) => {
    await signInThroughForm(page, DEMO.technician);
    const res = await page.goto('/admin/users');
    expect(res?.status()).toBe(403);
    await expect(page.getByRole('heading', { name: 'Not open to your roles' })).toBeVisible();
  });
});

test.describe('throttling and deactivation over HTTP', () => {
  test('5 failures lock the account for 15 minutes, even for the right password', async () => {
    const email = 'throttle.e2e@kestrelhollow.example';
    await makeUser(email, ['formulator'], 'right-password-123');
    const ctx = await request.newContext({ baseURL: BASE });
    for (let i = 0; i < 5; i++) expect(await postSignIn(ctx, email, 'wrong')).toContain('error=CredentialsSignin');
    expect(await postSignIn(ctx, email, 'right-password-123')).toContain('error=CredentialsSignin');
    await ctx.dispose();
  });

  test('a deactivated user loses the session and the API token at once', async () => {
    const email = 'deactivate.e2e@kestrelhollow.example';
    const id = await makeUser(email, ['quality'], 'right-password-123');
    const user = await signedInContext(email, 'right-password-123');
    expect((await user.get('/api/v1/me')).status()).toBe(200);
    const token = await tokenFor(user, 'cli', 30);
    const bearer = await request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${token}` } });
    expect((await bearer.get('/api/v1/me')).status()).toBe(200);

    const admin = await signedInContext(DEMO.admin);
    const off = await admin.post('/admin/users?/setActive', { headers: { Origin: BASE }, form: { userId: String(id), active: 'false' } });
    expect(off.status()).toBe(200);
    expect((await user.get('/api/v1/me')).status()).toBe(401);
    expect((await bearer.get('/api/v1/me')).status()).toBe(401);
    const again = await request.newContext({ baseURL: BASE });
    expect(await postSignIn(again, email, 'right-password-123')).toContain('error=CredentialsSignin');
    await Promise.all([user.dispose(), bearer.dispose(), admin.dispose(), again.dispose()]);
  });

  test('a revoked token stops working', async ({ page }) => {
    await signInThroughForm(page, DEMO.formulator);
    await page.goto('/profile');
    await page.getByLabel('Name').fill('revocation probe');
    await page.getByRole('button', { name: 'Create token' }).click();
    const token = (await page.getByTestId('new-token').textContent())!.trim();
    const bearer = await request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${token}` } });
    const me = await bearer.get('/api/v1/me');
    expect(me.status()).toBe(200);
    expect((await me.json()).roles).toEqual(['formulator']);
    await page
      .getByRole('row', { name: /revocation probe/ })
      .getByRole('button', { name: 'Revoke' })
      .click();
    await expect(page.getByRole('row', { name: /revocation probe/ })).toContainText('revoked');
    expect((await bearer.get('/api/v1/me')).status()).toBe(401);
    await bearer.dispose();
  });
});

test('the audit trail records the connection address of a sign-in, not a client-sent X-Forwarded-For', async ({ page }) => {
  // 203.0.113.0/24 is reserved for documentation (RFC 5737): no real client has it.
  const email = 'address.probe@kestrelhollow.example';
  await makeUser(email, ['quality'], 'address-probe-password-1');
  const ctx = await request.newContext({ baseURL: BASE, extraHTTPHeaders: { 'X-Forwarded-For': '203.0.113.9' } });
  await postSignIn(ctx, email, 'address-probe-password-1');
  await page.setExtraHTTPHeaders({ 'X-Forwarded-For': '203.0.113.10' });
  await signInThroughForm(page, email, 'address-probe-password-1');
  await ctx.dispose();
  const knex = testDb();
  try {
    const rows = await knex('audit_events').where({ actor_email: email, action: 'sign-in' }).orderBy('id', 'desc').limit(2).pluck('ip');
    expect(rows).toEqual(['127.0.0.1', '127.0.0.1']);
    const attempts = await knex('sign_in_attempts').where({ email, succeeded: 1 }).orderBy('id', 'desc').limit(2).pluck('ip');
    expect(attempts).toEqual(['127.0.0.1', '127.0.0.1']);
  } finally {
    await knex.destroy();
  }
});
