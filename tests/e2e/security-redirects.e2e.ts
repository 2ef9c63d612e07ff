import { test, expect, request, type APIRequestContext } from '@playwright/test';
import { BASE, DEMO, DEMO_PASSWORD, signedInContext } from './support/accounts';

// Where sign-in, sign-out and Auth.js send the browser: never off-site, whatever the client sends.

function setCookies(res: { headersArray(): { name: string; value: string }[] }): string[] {
  return res
    .headersArray()
    .filter((h) => h.name.toLowerCase() === 'set-cookie')
    .map((h) => h.value);
}

/** True when a browser on BASE would follow this Location to BASE itself. */
function staysOnSite(location: string | undefined): boolean {
  // WHATWG URL Standard: "\" is read as "/" and tab/LF/CR are dropped for http(s) URLs.
  return !!location && new URL(location, BASE).origin === new URL(BASE).origin;
}

test('a signed-in visit to /signin follows only same-origin paths', async () => {
  const ctx = await signedInContext(DEMO.formulator);
  for (const query of ['/%5Cevil.example', '/%09/evil.example', '//evil.example', '/.//evil.example', 'https://evil.example/']) {
    const res = await ctx.get(`/signin?redirectTo=${query}`, { maxRedirects: 0 });
    expect(res.status(), query).toBe(303);
    expect(res.headers()['location'], query).toBe('/');
  }
  const ok = await ctx.get(`/signin?redirectTo=${encodeURIComponent('/library?q=YAG')}`, { maxRedirects: 0 });
  expect(ok.headers()['location']).toBe('/library?q=YAG');
  await ctx.dispose();
});

async function formSignIn(ctx: APIRequestContext, redirectTo: string, extra: Record<string, string> = {}) {
  return ctx.post(`/signin?redirectTo=${encodeURIComponent(redirectTo)}`, {
    headers: { Origin: BASE, accept: 'text/html', ...extra },
    form: { providerId: 'credentials', redirectTo, email: DEMO.formulator, password: DEMO_PASSWORD },
    maxRedirects: 0
  });
}

test('the sign-in form does not send the user off-site from its redirectTo field', async () => {
  const ctx = await request.newContext({ baseURL: BASE });
  for (const target of ['/\\evil.example', '/\t/evil.example', 'https://evil.example/']) {
    const res = await formSignIn(ctx, target);
    expect(res.status(), JSON.stringify(target)).toBeGreaterThanOrEqual(300);
    expect(res.status()).toBeLessThan(400);
    const location = res.headers()['location'];
    expect(staysOnSite(location), `${JSON.stringify(target)} -> ${location}`).toBe(true);
    expect(location).not.toMatch(/evil/);
  }
  await ctx.dispose();
});

test('X-Forwarded-Host from a client does not move the sign-in redirect or the cookie rules', async () => {
  const ctx = await request.newContext({ baseURL: BASE });
  const res = await formSignIn(ctx, '/formulations', { 'X-Forwarded-Host': 'evil.example', 'X-Forwarded-Proto': 'https' });
  expect([302, 303]).toContain(res.status());
  const location = res.headers()['location'];
  expect(location).not.toMatch(/evil/);
  expect(staysOnSite(location), location).toBe(true);
  // The app's origin is http://127.0.0.1: a Secure cookie would be dropped by the browser, so none is set.
  const session = setCookies(res).find((c) => /session-token=/.test(c));
  expect(session).toMatch(/^authjs\.session-token=/);
  expect(session).not.toMatch(/;\s*Secure/i);
  expect((await ctx.get('/api/v1/me')).status()).toBe(200);
  await ctx.dispose();
});

test('GET /signout asks for confirmation when signed in and goes home when not', async () => {
  const anonymous = await request.newContext({ baseURL: BASE });
  const away = await anonymous.get('/signout', { maxRedirects: 0 });
  expect(away.status()).toBe(303);
  expect(away.headers()['location']).toBe('/');
  await anonymous.dispose();

  const ctx = await signedInContext(DEMO.formulator);
  const page = await ctx.get('/signout', { maxRedirects: 0 });
  expect(page.status()).toBe(200);
  const html = await page.text();
  expect(html).toMatch(/<form method="POST"/);
  expect(html).toContain('Sign out of Phosforge');
  // Viewing the page changed nothing: the session still works.
  expect((await ctx.get('/api/v1/me')).status()).toBe(200);
  // Signing out stays a POST, refused from another site (CSRF).
  expect((await ctx.post('/signout', { headers: { Origin: 'https://evil.example' }, form: {}, maxRedirects: 0 })).status()).toBe(403);
  await ctx.dispose();
});
