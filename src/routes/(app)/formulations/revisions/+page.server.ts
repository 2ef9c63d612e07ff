import { requireUser } from '$lib/server/auth/require';
import { mayActOnRevisions } from '$lib/access/policies';
import { listRevisions, parseListQuery, revisionListSchema } from '$lib/server/formulations/lists';
import * as users from '$lib/server/db/users';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals);
  const { query, error } = parseListQuery(revisionListSchema, url.searchParams);
  const authors = (await users.list()).filter((u) => mayActOnRevisions(u)).map((u) => ({ id: u.id, name: u.name }));
  return { query, queryError: error, list: await listRevisions(query), authors };
};
