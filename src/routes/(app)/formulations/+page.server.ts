import { requireUser } from '$lib/server/auth/require';
import { mayAuthorFormulations } from '$lib/access/policies';
import { formulationListSchema, listFormulations, parseListQuery } from '$lib/server/formulations/lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  const user = requireUser(locals);
  const { query, error } = parseListQuery(formulationListSchema, url.searchParams);
  return {
    query,
    queryError: error,
    list: await listFormulations(query),
    canCreate: mayAuthorFormulations(user)
  };
};
