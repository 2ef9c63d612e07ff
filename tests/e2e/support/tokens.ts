/** API tokens for end-to-end tests, made through the profile page's action (as a person would). */
import { request, expect, type APIRequestContext } from '@playwright/test';
import { BASE, signedInContext } from './accounts';

/** Signs in on the suite's instance, creates a one-day token on the profile page and returns it. */
export async function createApiToken(email: string, password: string, name = 'e2e'): Promise<string> {
  const ctx = await signedInContext(email, password);
  try {
    const res = await ctx.post('/profile?/createToken', { headers: { Origin: BASE, 'x-sveltekit-action': 'true' }, form: { name, days: '1' } });
    expect(res.status()).toBe(200);
    const token = JSON.parse((await res.json()).data).find((v: unknown) => typeof v === 'string' && v.startsWith('pfk_'));
    expect(token, 'the profile action returns the new token once').toBeTruthy();
    return token as string;
  } finally {
    await ctx.dispose();
  }
}

/** An API context that sends the token on every request to `base` (either app instance). */
export function tokenContext(base: string, token: string): Promise<APIRequestContext> {
  return request.newContext({ baseURL: base, extraHTTPHeaders: { Authorization: `Bearer ${token}`, Origin: base } });
}
