import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { idParam } from '$lib/server/http/id-param';
import { currentApprovedRevision, getFormulation } from '$lib/server/formulations/read';
import { listRevisions, parseListQuery, revisionListSchema } from '$lib/server/formulations/lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params, url }) => {
  requireUser(locals);
  const formulation = await getFormulation(idParam(params.id, 'No such formulation.'));
  if (!formulation) error(404, 'No such formulation.');
  const { query, error: queryError } = parseListQuery(revisionListSchema, url.searchParams);
  const q = { ...query, formulationId: formulation.id, sort: url.searchParams.has('sort') ? query.sort : ('revision' as const) };
  return { formulation, current: await currentApprovedRevision(formulation.id), query: q, queryError, list: await listRevisions(q) };
};
