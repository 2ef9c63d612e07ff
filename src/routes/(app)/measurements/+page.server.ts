import { requireUser } from '$lib/server/auth/require';
import { mayJudgeBatches } from '$lib/access/policies';
import { measurementQueue } from '$lib/server/measurements/queue';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  requireUser(locals, mayJudgeBatches);
  return measurementQueue();
};
