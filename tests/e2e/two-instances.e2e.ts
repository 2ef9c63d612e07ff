import { test, expect, request, type APIRequestContext } from '@playwright/test';
import { startApp, type AppInstance } from './support/instances';
import { BASE, makeUser, postSignIn } from './support/accounts';

// Two app instances behind one database: whatever one instance decides from shared state, the
// other must decide the same way (throttling counts, sessions, locks, approvals).
let second: AppInstance;
const contexts: APIRequestContext[] = [];

test.beforeAll(async () => {
  second = await startApp(4178);
});

test.afterAll(async () => {
  for (const c of contexts) await c.dispose();
  await second?.stop();
});

async function ctxFor(base: string): Promise<APIRequestContext> {
  const c = await request.newContext({ baseURL: base });
  contexts.push(c);
  return c;
}

test('sign-in failures on both instances add up to one throttle', async () => {
  const email = 'two.instances@kestrelhollow.example';
  await makeUser(email, ['formulator'], 'right-password-123');
  const a = await ctxFor(BASE);
  const b = await ctxFor(second.url);
  for (let i = 0; i < 3; i++) expect(await postSignIn(a, email, 'wrong')).toContain('error=CredentialsSignin');
  for (let i = 0; i < 2; i++) expect(await postSignIn(b, email, 'wrong', second.url)).toContain('error=CredentialsSignin');
  // Five failures in 15 minutes across the two instances: the right password is refused on either.
  expect(await postSignIn(a, email, 'right-password-123')).toContain('error=CredentialsSignin');
  expect(await postSignIn(b, email, 'right-password-123', second.url)).toContain('error=CredentialsSignin');
});

test('a session made on one instance is honoured by the other (shared secret, no server state)', async () => {
  const email = 'two.sessions@kestrelhollow.example';
  await makeUser(email, ['quality'], 'right-password-123');
  const a = await ctxFor(BASE);
  expect(await postSignIn(a, email, 'right-password-123')).not.toContain('error');
  const state = await a.storageState();
  const b = await request.newContext({ baseURL: second.url, storageState: { cookies: state.cookies.map((c) => ({ ...c, domain: '127.0.0.1' })), origins: [] } });
  contexts.push(b);
  const me = await b.get('/api/v1/me');
  expect(me.status()).toBe(200);
  expect((await me.json()).email).toBe(email);
});
