import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ApiError } from '$lib/server/api/body';
import { formulationsApi, idParam } from '$lib/server/formulations/api';
import { currentApprovedRevision, getFormulation } from '$lib/server/formulations/read';
import { listRevisions, revisionListSchema } from '$lib/server/formulations/lists';
import type { RequestHandler } from './$types';

/** One formulation, its current approved revision and its latest revisions. */
export const GET: RequestHandler = ({ locals, params }) =>
  formulationsApi(async () => {
    requireUser(locals);
    const id = idParam(params.id, 'Formulation');
    const formulation = await getFormulation(id);
    if (!formulation) throw new ApiError(404, `Formulation ${id} does not exist.`);
    const revisions = await listRevisions(revisionListSchema.parse({ formulationId: id, sort: 'revision', pageSize: 100 }));
    return json({ formulation, current: await currentApprovedRevision(id), revisions: revisions.rows });
  });
