import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { apiListQuery } from '$lib/server/formulations/api';
import { formulationListSchema, listFormulations } from '$lib/server/formulations/lists';
import { createFormulationWithDraft } from '$lib/server/formulations/save';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayAuthorFormulations } from '$lib/access/policies';
import type { RequestHandler } from './$types';

const createSchema = z.object({
  code: z.string().optional(),
  name: z.string(),
  description: z.string().optional(),
  content: z.unknown()
});

/** Formulations, filtered (q, status), sorted and paged on the server. */
export const GET: RequestHandler = ({ locals, url }) =>
  apiHandler(async () => {
    requireUser(locals);
    return json(await listFormulations(apiListQuery(formulationListSchema, url.searchParams)));
  });

/** A new formulation with its first draft revision. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayAuthorFormulations);
    const body = await readJson(event, createSchema);
    return json(await createFormulationWithDraft(user, body), { status: 201 });
  });
