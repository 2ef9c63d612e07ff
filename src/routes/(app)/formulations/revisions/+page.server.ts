import { requireUser } from '$lib/server/auth/require';
import { listRevisions, parseListQuery, revisionListSchema } from '$lib/server/formulations/lists';
import { authorChoices } from '$lib/server/accounts/directory';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals);
  const { query, error } = parseListQuery(revisionListSchema, url.searchParams);
  const authors = await authorChoices();
  return { query, queryError: error, list: await listRevisions(query), authors };
};
