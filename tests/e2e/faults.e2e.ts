import { test, expect, request } from '@playwright/test';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { privateDb, startApp, type AppInstance } from './support/instances';
import { DEMO, DEMO_PASSWORD } from './support/accounts';

// The database stops and comes back during a run: requests fail with a clear 503 while it is down
// and succeed afterwards without restarting the app. Uses a private server so the suite's
// database is never touched.
test.describe.configure({ timeout: 180_000 });

const dir = mkdtempSync(join(tmpdir(), 'phosforge-faults-'));
const db = privateDb(dir, 33319, 'phosforge_faults');
let app: AppInstance;

test.beforeAll(async () => {
  await db.start();
  await db.migrateAndSeed();
  app = await startApp(4179, db.env);
});

test.afterAll(async () => {
  await app?.stop();
  await db.stop().catch(() => undefined);
  rmSync(dir, { recursive: true, force: true });
});

test('a database outage answers 503 and the app recovers by itself', async () => {
  const ctx = await request.newContext({ baseURL: app.url });
  const signIn = await ctx.post('/auth/callback/credentials', {
    headers: { Origin: app.url },
    form: { email: DEMO.formulator, password: DEMO_PASSWORD, callbackUrl: '/' },
    maxRedirects: 0
  });
  expect(signIn.headers()['location'] ?? '').not.toContain('error');
  const me = async () => {
    const r = await ctx.get('/api/v1/me');
    return { status: r.status(), json: () => r.json() };
  };
  expect((await me()).status).toBe(200);
  expect(await (await fetch(`${app.url}/api/health`)).json()).toMatchObject({ app: 'up', database: 'up' });

  await db.stop();
  const down = await me();
  expect(down.status).toBe(503);
  expect((await down.json()).error).toMatch(/database is not reachable/i);
  const health = await fetch(`${app.url}/api/health`);
  expect(health.status).toBe(503);
  const page = await ctx.get('/', { headers: { accept: 'text/html' }, maxRedirects: 0 });
  expect(page.status()).toBe(503);
  // The page says which service is down, in words.
  const text = await page.text();
  expect(text).toMatch(/error 503/);
  expect(text).toMatch(/database is not reachable/i);

  await db.start();
  await expect.poll(async () => (await me()).status, { timeout: 30_000 }).toBe(200);
  await ctx.dispose();
});
