/** API tokens for end-to-end tests, made through the profile page's action (as a person would). */
import { request, expect, type APIRequestContext } from '@playwright/test';
import { BASE, signedInContext } from './accounts';

/** Creates a token through the profile page's action with a signed-in context and returns it. */
export async function tokenFor(ctx: APIRequestContext, name = 'e2e', days = 1): Promise<string> {
  const res = await ctx.post('/profile?/createToken', {
    headers: { Origin: BASE, 'x-sveltekit-action': 'true' },
    form: { name, days: String(days) }
  });
  expect(res.status()).toBe(200);
  const token = JSON.parse((await res.json()).data).find((v: unknown) => typeof v === 'string' && v.startsWith('pfk_'));
  // The action returns the new token once: the prefix and 30 random bytes in base64url.
  expect(token, 'the profile action returns the new token once').toMatch(/^pfk_[A-Za-z0-9_-]{40}$/);
  return token as string;
}

/** Signs in on the suite's instance, creates a one-day token on the profile page and returns it. */
export async function createApiToken(email: string, password: string, name = 'e2e'): Promise<string> {
  const ctx = await signedInContext(email, password);
  try {
    return await tokenFor(ctx, name);
  } finally {
    await ctx.dispose();
  }
}

/** An API context that sends the token on every request to `base` (either app instance). */
export function tokenContext(base: string, token: string): Promise<APIRequestContext> {
  return request.newContext({ baseURL: base, extraHTTPHeaders: { Authorization: `Bearer ${token}`, Origin: base } });
}
