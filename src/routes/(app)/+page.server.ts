import { requireUser } from '$lib/server/auth/require';
import { workQueues } from '$lib/server/home/work-queues';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  const user = requireUser(locals);
  return { roles: user.roles, queues: await workQueues(user) };
};
