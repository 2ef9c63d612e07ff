import { describe, expect, it } from 'vitest';
import { decide, navFor, ROUTE_TABLE } from '../../src/lib/access/route-table';
import { ROLES } from '../../src/lib/roles';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Route ids of every +page / +server file under src/routes, as SvelteKit names them. */
function routeIds(dir = 'src/routes', id = ''): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) out.push(...routeIds(full, `${id}/${name}`));
    else if (/^\+(page|server)\.(svelte|ts)$/.test(name)) out.push(id || '/');
  }
  return [...new Set(out)];
}

describe('route table (deny by default)', () => {
  it('lists every page and endpoint in src/routes, so no route is left open by omission', () => {
    const missing = routeIds().filter((id) => !(id in ROUTE_TABLE));
    expect(missing).toEqual([]);
  });

  it('refuses routes that are not in the table, for every role', () => {
    for (const role of ROLES) expect(decide('/not-in-table', 'GET', [role])).toBe('unlisted');
  });

  it('sends signed-out visitors to sign-in for protected routes and lets them reach public ones', () => {
    expect(decide('/(app)/profile', 'GET', null)).toBe('signin');
    expect(decide('/signin', 'GET', null)).toBe('allow');
    expect(decide('/api/health', 'GET', null)).toBe('allow');
  });

  it('keeps the people screen to admins', () => {
    expect(decide('/(app)/admin/users', 'GET', ['admin'])).toBe('allow');
    for (const role of ['formulator', 'technician', 'quality'] as const) {
      expect(decide('/(app)/admin/users', 'GET', [role])).toBe('forbidden');
      expect(navFor([role]).some((n) => n.href === '/admin/users')).toBe(false);
    }
  });

  it('treats a method the table does not list as forbidden', () => {
    expect(decide('/api/v1/me', 'DELETE', ['admin'])).toBe('forbidden');
  });
});
