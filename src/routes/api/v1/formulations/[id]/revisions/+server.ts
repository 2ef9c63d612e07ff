import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { apiListQuery } from '$lib/server/formulations/api';
import { getFormulation } from '$lib/server/formulations/read';
import { listRevisions, revisionListSchema } from '$lib/server/formulations/lists';
import { createRevision } from '$lib/server/formulations/save';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { notFound } from '$lib/errors/domain-error';
import { mayAuthorFormulations } from '$lib/access/policies';
import type { RequestHandler } from './$types';

const createSchema = z.object({ content: z.unknown(), basedOnRevisionId: z.number().int().positive().nullable().optional() });

async function formulationId(value: string | undefined): Promise<number> {
  const id = idParam(value, `Formulation ${value} does not exist.`);
  if (!(await getFormulation(id))) throw notFound(`Formulation ${id} does not exist.`);
  return id;
}

/** Revisions of one formulation, filtered (state, author), sorted and paged. */
export const GET: RequestHandler = ({ locals, params, url }) =>
  apiHandler(async () => {
    requireUser(locals);
    const id = await formulationId(params.id);
    return json(await listRevisions(apiListQuery(revisionListSchema, url.searchParams, { formulationId: id })));
  });

/** A new draft revision (optionally started from an earlier revision). */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayAuthorFormulations);
    const id = await formulationId(event.params.id);
    const body = await readJson(event, createSchema);
    return json(await createRevision(user, id, body.content, body.basedOnRevisionId ?? null), { status: 201 });
  });
