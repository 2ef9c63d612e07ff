/**
 * Who may use which route: the one table (assembled from one file per feature in ./routes/) the
 * guard in hooks.server.ts enforces (deny by default: a route that is missing here answers 403 for
 * everyone). Keys are SvelteKit route ids.
 * `sample` is a concrete path for the route-by-role tests; `methods` lists the roles per HTTP
 * method ('public' = no sign-in, 'signedIn' = any active user). Page form actions are POSTs.
 */
import type { Role } from '../roles';
import type { Method, RouteRule } from './routes/shared';
import { CORE_ROUTES } from './routes/core';
import { LIBRARY_ROUTES } from './routes/library';
import { DESIGNER_ROUTES } from './routes/designer';
import { FORMULATIONS_ROUTES } from './routes/formulations';
import { BATCHES_ROUTES } from './routes/batches';
import { MEASUREMENTS_ROUTES } from './routes/measurements';
import { PACKAGE_MODELS_ROUTES } from './routes/package-models';

export type { Audience, Method, RouteRule } from './routes/shared';

export const ROUTE_TABLE: Record<string, RouteRule> = {
  ...CORE_ROUTES,
  ...LIBRARY_ROUTES,
  ...DESIGNER_ROUTES,
  ...FORMULATIONS_ROUTES,
  ...BATCHES_ROUTES,
  ...MEASUREMENTS_ROUTES,
  ...PACKAGE_MODELS_ROUTES
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
