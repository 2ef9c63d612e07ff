import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson, readQuery } from '$lib/server/api/body';
import { createBatch } from '$lib/server/batches/create';
import { listBatches } from '$lib/server/batches/read';
import { createBatchSchema, listQuerySchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayPlanBatch } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Batches, newest first: ?state=, ?q= (batch number or lot), ?lot= (exact lot), ?revisionId=, ?limit=, ?offset=. */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    return json(await listBatches(readQuery(event.url.searchParams, listQuerySchema)));
  });

/** Plans a batch from an approved revision (technicians and admins). */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayPlanBatch);
    const body = await readJson(event, createBatchSchema);
    const created = await createBatch(user, body);
    return json(created, { status: 201, headers: { location: `/api/v1/batches/${created.id}` } });
  });
