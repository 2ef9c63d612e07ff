/**
 * Role assertions for loads, actions and endpoints. The guard in hooks.server.ts already
 * enforces the route table; these make each handler safe on its own as well. `allowed` is a
 * named policy (`$lib/access/policies`), whose roles the route table lists too.
 */
import { error } from '@sveltejs/kit';
import type { RolePolicy } from '../../access/policies';
import type { User } from '../accounts/users';

export function requireUser(locals: App.Locals, allowed?: Pick<RolePolicy, 'roles'>): User {
  const user = locals.user;
  if (!user) error(401, 'Sign-in required.');
  if (allowed && !allowed.roles.some((r) => user.roles.includes(r))) {
    error(403, { message: 'Forbidden', reason: `This needs one of the roles: ${allowed.roles.join(', ')}.` });
  }
  return user;
}
