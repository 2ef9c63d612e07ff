import { test, expect, request, type APIRequestContext } from '@playwright/test';
import { ROUTE_TABLE, type Method, type Audience } from '../../src/lib/access/route-table';
import { ROLES, type Role } from '../../src/lib/roles';
import { BASE, DEMO, makeUser, signedInContext, testDb } from './support/accounts';
import { tokenFor } from './support/tokens';

// Every route in the role table, for every role, signed out, and with an API token:
// the guard must answer exactly as the table says (the test reads the same table, so a new
// route cannot be left out). Credentials that no longer count — an expired or revoked token, the
// session and the token of a deactivated user (who held every role) — must be treated as signed out.
type Dead = 'token:expired' | 'token:revoked' | 'token:deactivated' | 'session:deactivated';
type Who = Role | 'anonymous' | `token:${Role}` | Dead;
const DEAD_TOKENS: Dead[] = ['token:expired', 'token:revoked', 'token:deactivated'];

function expected(audience: Audience, who: Who): 'allow' | 'signin' | 'forbidden' {
  const role =
    who === 'anonymous' || who.endsWith(':expired') || who.endsWith(':revoked') || who.endsWith(':deactivated')
      ? null
      : (who.replace('token:', '') as Role);
  if (audience === 'public') return 'allow';
  if (!role) return 'signin';
  if (audience === 'signedIn') return 'allow';
  return audience.includes(role) ? 'allow' : 'forbidden';
}

const contexts = new Map<Who, APIRequestContext>();

test.beforeAll(async () => {
  const bearer = (t: string) => request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${t}` } });
  contexts.set('anonymous', await request.newContext({ baseURL: BASE }));
  for (const role of ROLES) {
    const ctx = await signedInContext(DEMO[role]);
    contexts.set(role, ctx);
    const token = await tokenFor(ctx, 'matrix');
    contexts.set(`token:${role}`, await bearer(token));
  }
  // Two accounts with every role: one keeps an expired and a revoked token (the account stays
  // active, so only the token's state can refuse), the other is deactivated with a live token and session.
  const staleId = await makeUser('matrix.stale@kestrelhollow.example', [...ROLES], 'matrix-stale-password-1');
  const stale = await signedInContext('matrix.stale@kestrelhollow.example', 'matrix-stale-password-1');
  const [expiring, revoking] = [await tokenFor(stale, 'to expire'), await tokenFor(stale, 'to revoke')];
  await stale.dispose();
  const deadId = await makeUser('matrix.dead@kestrelhollow.example', [...ROLES], 'matrix-dead-password-1');
  const session = await signedInContext('matrix.dead@kestrelhollow.example', 'matrix-dead-password-1');
  const live = await tokenFor(session, 'live');
  const knex = testDb();
  try {
    await knex('api_tokens')
      .where({ user_id: staleId, name: 'to expire' })
      .update({ expires_at: new Date(Date.now() - 86_400_000) });
    await knex('api_tokens').where({ user_id: staleId, name: 'to revoke' }).update({ revoked_at: new Date() });
    await knex('users').where({ id: deadId }).update({ active: false, deactivated_at: new Date() });
  } finally {
    await knex.destroy();
  }
  contexts.set('token:expired', await bearer(expiring));
  contexts.set('token:revoked', await bearer(revoking));
  contexts.set('token:deactivated', await bearer(live));
  contexts.set('session:deactivated', session);
});

test.afterAll(async () => {
  for (const ctx of contexts.values()) await ctx.dispose();
});

test('every route × role × method answers as the route table says', async () => {
  const failures: string[] = [];
  let checks = 0;
  for (const [id, rule] of Object.entries(ROUTE_TABLE)) {
    const isApi = rule.sample.startsWith('/api/');
    if (id === '/signout') continue; // signing out would end the shared sessions; covered in sign-in.e2e.ts
    for (const [method, audience] of Object.entries(rule.methods) as [Method, Audience][]) {
      const whos: Who[] = [
        'anonymous',
        ...ROLES,
        'session:deactivated',
        ...(isApi ? [...ROLES.map((r) => `token:${r}` as Who), ...DEAD_TOKENS] : [])
      ];
      for (const who of whos) {
        const ctx = contexts.get(who)!;
        const res = await ctx.fetch(rule.sample, {
          method,
          headers: { Origin: BASE, accept: isApi ? 'application/json' : 'text/html' },
          maxRedirects: 0,
          data: method === 'GET' ? undefined : {}
        });
        const status = res.status();
        const want = expected(audience, who);
        const location = res.headers()['location'] ?? '';
        const ok =
          want === 'forbidden'
            ? status === 403
            : want === 'signin'
              ? isApi
                ? status === 401
                : status === 303 && location.startsWith('/signin')
              : status !== 401 && status !== 403 && !(status === 303 && location.startsWith('/signin'));
        checks++;
        if (!ok) failures.push(`${method} ${rule.sample} as ${who}: expected ${want}, got ${status} ${location}`);
      }
    }
  }
  console.log(`route guard: ${checks} route × role × method checks`);
  expect(failures).toEqual([]);
});

test('a route outside the table is refused for everyone, a method outside the table too', async () => {
  const admin = contexts.get('admin')!;
  expect((await admin.delete('/api/v1/me', { headers: { Origin: BASE } })).status()).toBe(403);
});

test('health answers without sign-in and reports the database', async () => {
  const res = await contexts.get('anonymous')!.get('/api/health');
  expect(res.status()).toBe(200);
  expect(await res.json()).toMatchObject({ app: 'up', database: 'up' });
});
