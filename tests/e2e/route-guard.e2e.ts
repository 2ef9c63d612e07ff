import { test, expect, request, type APIRequestContext } from '@playwright/test';
import { ROUTE_TABLE, type Method, type Audience } from '../../src/lib/access/route-table';
import { ROLES, type Role } from '../../src/lib/access/roles';
import { BASE, DEMO, signedInContext } from './support/accounts';
import { tokenFor } from './support/tokens';

// Every route in the role table, for every role, signed out, and with an API token:
// the guard must answer exactly as the table says (the test reads the same table, so a new
// route cannot be left out).
type Who = Role | 'anonymous' | `token:${Role}`;

function expected(audience: Audience, who: Who): 'allow' | 'signin' | 'forbidden' {
  const role = who === 'anonymous' ? null : (who.replace('token:', '') as Role);
  if (audience === 'public') return 'allow';
  if (!role) return 'signin';
  if (audience === 'signedIn') return 'allow';
  return audience.includes(role) ? 'allow' : 'forbidden';
}

const contexts = new Map<Who, APIRequestContext>();

test.beforeAll(async () => {
  contexts.set('anonymous', await request.newContext({ baseURL: BASE }));
  for (const role of ROLES) {
    const ctx = await signedInContext(DEMO[role]);
    contexts.set(role, ctx);
    const token = await tokenFor(ctx, 'matrix');
    contexts.set(`token:${role}`, await request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${token}` } }));
  }
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
      const whos: Who[] = ['anonymous', ...ROLES, ...(isApi ? ROLES.map((r) => `token:${r}` as Who) : [])];
      for (const who of whos) {
        const ctx = contexts.get(who)!;
        const res = await ctx.fetch(rule.sample, { method, headers: { Origin: BASE, accept: isApi ? 'application/json' : 'text/html' }, maxRedirects: 0, data: method === 'GET' ? undefined : {} });
        const status = res.status();
        const want = expected(audience, who);
        const location = res.headers()['location'] ?? '';
        const ok = want === 'forbidden' ? status === 403
          : want === 'signin' ? (isApi ? status === 401 : status === 303 && location.startsWith('/signin'))
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
