import { requireUser } from '$lib/server/auth/require';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals }) => {
  const user = requireUser(locals);
  return { roles: user.roles };
};
