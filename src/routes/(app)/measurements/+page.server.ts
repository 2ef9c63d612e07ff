import { requireUser } from '$lib/server/auth/require';
import { QUALITY } from '$lib/access/routes/shared';
import { measurementQueue } from '$lib/server/quality/queue';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  requireUser(locals, QUALITY);
  return measurementQueue();
};
