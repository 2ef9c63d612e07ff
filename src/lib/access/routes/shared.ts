/** Types and role groups shared by the per-feature route tables. */
import type { Role } from '../../roles';

export type Audience = 'public' | 'signedIn' | readonly Role[];
export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RouteRule {
  /** A concrete path for the route-by-role tests. */
  sample: string;
  /** Roles per HTTP method ('public' = no sign-in, 'signedIn' = any active user). Form actions are POSTs. */
  methods: Partial<Record<Method, Audience>>;
  /** Shown in the navigation for these roles (pages only). */
  nav?: { label: string; order: number };
}

export type RouteTable = Record<string, RouteRule>;

export { ADMIN, ALL, FORMULATION_EDITORS, LINE, QUALITY, REVISION_ACTORS } from '../../roles';
