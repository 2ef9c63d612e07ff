import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { scaleBatch } from '$lib/server/batches/scale';
import { scaleSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayWeigh } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Rescales a planned batch: { version, batchMassG } or { version, factor }. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayWeigh);
    const body = await readJson(event, scaleSchema);
    return json(await scaleBatch(user, idParam(event.params.id, 'Batch was not found.'), body));
  });
