/**
 * Role assertions for loads, actions and endpoints. The guard in hooks.server.ts already
 * enforces the route table; these make each handler safe on its own as well.
 */
import { error } from '@sveltejs/kit';
import type { Role } from '../../access/roles';
import type { User } from '../db/users';

export function requireUser(locals: App.Locals, roles?: readonly Role[]): User {
  const user = locals.user;
  if (!user) error(401, 'Sign-in required.');
  if (roles && !roles.some((r) => user.roles.includes(r))) {
    error(403, { message: 'Forbidden', reason: `This needs one of the roles: ${roles.join(', ')}.` });
  }
  return user;
}
