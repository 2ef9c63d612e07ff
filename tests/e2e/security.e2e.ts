import { test, expect, request } from '@playwright/test';
import { startApp, type AppInstance } from './support/instances';
import { BASE, DEMO, DEMO_PASSWORD, makeUser, postSignIn, signedInContext, testDb } from './support/accounts';

// Security checks beyond the route × role matrix (route-guard.e2e.ts): CSRF on form actions,
// cookie flags in production, passwords never logged, security headers.

test('form actions refuse a cross-site origin (CSRF)', async () => {
  const ctx = await signedInContext(DEMO.admin);
  const res = await ctx.post('/profile?/createToken', {
    headers: { Origin: 'https://evil.example' },
    form: { name: 'csrf', days: '1' },
    maxRedirects: 0
  });
  expect(res.status()).toBe(403);
  const ok = await ctx.post('/profile?/createToken', {
    headers: { Origin: BASE, 'x-sveltekit-action': 'true' },
    form: { name: 'same-site', days: '1' }
  });
  expect(ok.status()).toBe(200);
  await ctx.dispose();
});

test('pages carry a content security policy and refuse framing', async () => {
  const ctx = await request.newContext({ baseURL: BASE });
  const res = await ctx.get('/signin');
  const h = res.headers();
  expect(h['content-security-policy']).toMatch(/default-src 'self'/);
  expect(h['content-security-policy']).toMatch(/frame-ancestors 'none'/);
  expect(h['content-security-policy']).toMatch(/object-src 'none'/);
  expect(h['x-frame-options']).toBe('DENY');
  expect(h['x-content-type-options']).toBe('nosniff');
  const api = await ctx.get('/api/health');
  expect(api.headers()['x-frame-options']).toBe('DENY');
  await ctx.dispose();
});

test.describe('production mode', () => {
  let app: AppInstance;
  const origin = 'https://phosforge.kestrelhollow.example';
  test.beforeAll(async () => {
    app = await startApp(4177, { NODE_ENV: 'production', ORIGIN: origin });
  });
  test.afterAll(async () => app?.stop());

  test('session cookies are Secure, HttpOnly and SameSite behind an https origin', async () => {
    const ctx = await request.newContext({ baseURL: app.url });
    const res = await ctx.post('/auth/callback/credentials', {
      headers: { Origin: origin },
      form: { email: DEMO.quality, password: DEMO_PASSWORD, callbackUrl: '/' },
      maxRedirects: 0
    });
    expect(res.status()).toBe(302);
    const cookies = res
      .headersArray()
      .filter((h) => h.name.toLowerCase() === 'set-cookie')
      .map((h) => h.value);
    const session = cookies.find((c) => /session-token=/.test(c));
    expect(session, cookies.join('\n')).toMatch(/^__Secure-authjs\.session-token=[^;]+;/);
    expect(session).toMatch(/;\s*Secure/i);
    expect(session).toMatch(/;\s*HttpOnly/i);
    expect(session).toMatch(/;\s*SameSite=Lax/i);
    await ctx.dispose();
  });

  test('passwords never reach the logs or the audit trail', async () => {
    const email = 'log.probe@kestrelhollow.example';
    const right = 'Kestrel-right-Password-7731';
    const wrong = 'Kestrel-wrong-Password-9902';
    await makeUser(email, ['formulator'], right);
    const ctx = await request.newContext({ baseURL: app.url });
    await postSignIn(ctx, email, wrong, origin);
    await postSignIn(ctx, email, right, origin);
    await ctx.post('/signin', { headers: { Origin: origin }, form: { email, password: wrong }, maxRedirects: 0 });
    await ctx.dispose();
    expect(app.logs()).not.toContain(wrong);
    expect(app.logs()).not.toContain(right);
    const knex = testDb();
    try {
      const rows = await knex('audit_events').where({ actor_email: email });
      expect(rows.length).toBeGreaterThan(0);
      const text = JSON.stringify(rows);
      expect(text).not.toContain(wrong);
      expect(text).not.toContain(right);
    } finally {
      await knex.destroy();
    }
  });
});

test('form posts with a body that is not a readable form are refused with 400, not an error', async () => {
  const knex = testDb();
  const batchId = (await knex('batches').where({ state: 'complete' }).first('id'))?.id ?? (await knex('batches').first('id'))!.id;
  const materialId = (await knex('materials').first('id'))!.id;
  await knex.destroy();
  // A multipart body cut off before its closing boundary, as a dropped connection leaves it.
  const cutOff =
    '--XYZ\r\nContent-Disposition: form-data; name="file"; filename="spd.csv"\r\nContent-Type: text/csv\r\n\r\n380,0.1\r\n381,0.2\r\n';
  const headers = { Origin: BASE, 'content-type': 'multipart/form-data; boundary=XYZ', accept: 'text/html' };
  const anonymous = await request.newContext({ baseURL: BASE });
  expect((await anonymous.post('/signin', { headers, data: cutOff, maxRedirects: 0 })).status()).toBe(400);
  await anonymous.dispose();
  const cases: [string, string][] = [
    [DEMO.formulator, '/profile?/createToken'],
    [DEMO.formulator, `/library/${materialId}/spectrum?/preview`],
    [DEMO.formulator, `/library/${materialId}?/addLot`],
    [DEMO.quality, `/measurements/${batchId}?/upload`]
  ];
  for (const [who, url] of cases) {
    const ctx = await signedInContext(who);
    const res = await ctx.post(url, { headers, data: cutOff, maxRedirects: 0 });
    expect(res.status(), `${url}: ${(await res.text()).slice(0, 200)}`).toBe(400);
    expect(await res.text()).toContain('The form could not be read');
    await ctx.dispose();
  }
});
