/**
 * Who may use which route: the one table the guard in hooks.server.ts enforces (deny by default:
 * a route that is missing here answers 403 for everyone). Keys are SvelteKit route ids.
 * `sample` is a concrete path for the route-by-role tests; `methods` lists the roles per HTTP
 * method ('public' = no sign-in, 'signedIn' = any active user). Page form actions are POSTs.
 */
import type { Role } from './roles';

export type Audience = 'public' | 'signedIn' | readonly Role[];
export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RouteRule {
  sample: string;
  methods: Partial<Record<Method, Audience>>;
  /** Shown in the navigation for these roles (pages only). */
  nav?: { label: string; order: number };
}

const ALL: readonly Role[] = ['formulator', 'technician', 'quality', 'admin'];
const ADMIN: readonly Role[] = ['admin'];

export const ROUTE_TABLE: Record<string, RouteRule> = {
  '/(app)': { sample: '/', methods: { GET: 'signedIn' } },
  '/signin': { sample: '/signin', methods: { GET: 'public', POST: 'public' } },
  '/signout': { sample: '/signout', methods: { POST: 'signedIn' } },
  '/invite/[token]': { sample: '/invite/nonexistent-token', methods: { GET: 'public', POST: 'public' } },
  '/(app)/profile': { sample: '/profile', methods: { GET: 'signedIn', POST: 'signedIn' }, nav: { label: 'Profile & tokens', order: 90 } },
  '/(app)/admin/users': { sample: '/admin/users', methods: { GET: ADMIN, POST: ADMIN }, nav: { label: 'People', order: 80 } },
  '/api/health': { sample: '/api/health', methods: { GET: 'public' } },
  '/api/v1/me': { sample: '/api/v1/me', methods: { GET: ALL } }
};

/** Decision for one request. */
export type AccessDecision = 'allow' | 'signin' | 'forbidden' | 'unlisted';

export function decide(routeId: string | null, method: string, roles: readonly Role[] | null): AccessDecision {
  if (routeId === null) return 'allow'; // no route matched: SvelteKit answers 404 itself
  const rule = ROUTE_TABLE[routeId];
  if (!rule) return 'unlisted';
  const m = (method === 'HEAD' ? 'GET' : method) as Method;
  const audience = rule.methods[m];
  if (audience === undefined) return roles ? 'forbidden' : 'signin';
  if (audience === 'public') return 'allow';
  if (!roles) return 'signin';
  if (audience === 'signedIn') return 'allow';
  return audience.some((r) => roles.includes(r)) ? 'allow' : 'forbidden';
}

/** Navigation entries a user with these roles may open, in menu order. */
export function navFor(roles: readonly Role[]): { href: string; label: string }[] {
  return Object.entries(ROUTE_TABLE)
    .filter(([id, r]) => r.nav && decide(id, 'GET', roles) === 'allow')
    .sort(([, a], [, b]) => a.nav!.order - b.nav!.order)
    .map(([, r]) => ({ href: r.sample, label: r.nav!.label }));
}
