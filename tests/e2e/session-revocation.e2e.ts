import { test, expect, request } from '@playwright/test';
import { BASE, DEMO, makeUser, postSignIn, signedInContext } from './support/accounts';
import { tokenFor } from './support/tokens';

// Sessions are revoked on the server: a cookie copied before sign-out, deactivation or a role change
// no longer answers, on the API, on pages and on /auth/session; reactivation brings nothing back.

/** A second context holding a copy of the first one's cookies (a stolen or forgotten browser session). */
async function copyOf(ctx: Awaited<ReturnType<typeof signedInContext>>) {
  return request.newContext({ baseURL: BASE, storageState: await ctx.storageState() });
}

const sessionUser = async (ctx: Awaited<ReturnType<typeof signedInContext>>) => {
  const res = await ctx.get('/auth/session');
  return res.ok() ? ((await res.json()) as { user?: { email?: string } } | null)?.user?.email : undefined;
};

test('sign-out ends the session on the server: a copied cookie answers 401, pages send it to sign-in', async () => {
  const email = `signout-${Date.now().toString(36)}@kh.example`;
  await makeUser(email, ['formulator'], 'right-password-123');
  const user = await signedInContext(email, 'right-password-123');
  const copy = await copyOf(user);
  expect((await copy.get('/api/v1/me')).status()).toBe(200);
  expect(await sessionUser(copy)).toBe(email);

  expect((await user.post('/signout', { headers: { Origin: BASE }, form: {}, maxRedirects: 0 })).status()).toBeLessThan(400);
  expect((await copy.get('/api/v1/me')).status()).toBe(401);
  const page = await copy.get('/formulations', { maxRedirects: 0 });
  expect(page.status()).toBe(303);
  expect(page.headers()['location']).toContain('/signin');
  expect(await sessionUser(copy)).toBeUndefined();
  // Signing in again works and gives a fresh session.
  const again = await signedInContext(email, 'right-password-123');
  expect((await again.get('/api/v1/me')).status()).toBe(200);
  await Promise.all([user.dispose(), copy.dispose(), again.dispose()]);
});

test('a role change ends the sessions; reactivation brings back neither the old session nor the old token', async () => {
  const email = `revive-${Date.now().toString(36)}@kh.example`;
  const id = await makeUser(email, ['quality'], 'right-password-123');
  const user = await signedInContext(email, 'right-password-123');
  const token = await tokenFor(user, 'cli', 30);
  const bearer = await request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${token}` } });
  const admin = await signedInContext(DEMO.admin);
  const post = (action: string, form: Record<string, string>) => admin.post(`/admin/users?/${action}`, { headers: { Origin: BASE }, form });

  expect((await post('setRoles', { userId: String(id), roles: 'formulator' })).status()).toBe(200);
  expect((await user.get('/api/v1/me')).status()).toBe(401);

  const second = await signedInContext(email, 'right-password-123');
  expect((await second.get('/api/v1/me')).status()).toBe(200);
  expect((await post('setActive', { userId: String(id), active: 'false' })).status()).toBe(200);
  expect((await post('setActive', { userId: String(id), active: 'true' })).status()).toBe(200);
  expect((await second.get('/api/v1/me')).status()).toBe(401);
  expect((await bearer.get('/api/v1/me')).status()).toBe(401);
  const fresh = await request.newContext({ baseURL: BASE });
  expect(await postSignIn(fresh, email, 'right-password-123')).not.toContain('error');
  expect((await fresh.get('/api/v1/me')).status()).toBe(200);
  await Promise.all([user.dispose(), second.dispose(), bearer.dispose(), admin.dispose(), fresh.dispose()]);
});
