import { requireUser } from '$lib/server/auth/require';
import { formulationListSchema, listFormulations, parseListQuery } from '$lib/server/formulations/lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  const user = requireUser(locals);
  const { query, error } = parseListQuery(formulationListSchema, url.searchParams);
  return {
    query,
    queryError: error,
    list: await listFormulations(query),
    canCreate: user.roles.some((r) => r === 'formulator' || r === 'admin')
  };
};
