import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { currentApprovedRevision, getFormulation } from '$lib/server/formulations/read';
import { listRevisions, revisionListSchema } from '$lib/server/formulations/lists';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { notFound } from '$lib/errors/domain-error';
import type { RequestHandler } from './$types';

/** One formulation, its current approved revision and its latest revisions. */
export const GET: RequestHandler = ({ locals, params }) =>
  apiHandler(async () => {
    requireUser(locals);
    const id = idParam(params.id, `Formulation ${params.id} does not exist.`);
    const formulation = await getFormulation(id);
    if (!formulation) throw notFound(`Formulation ${id} does not exist.`);
    const revisions = await listRevisions(revisionListSchema.parse({ formulationId: id, sort: 'revision', pageSize: 100 }));
    return json({ formulation, current: await currentApprovedRevision(id), revisions: revisions.rows });
  });
