import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi, pathId } from '$lib/server/batches/api';
import { scaleBatch } from '$lib/server/batches/scale';
import { LINE } from '$lib/access/routes/shared';
import { scaleSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** Rescales a planned batch: { version, batchMassG } or { version, factor }. */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    const user = requireUser(event.locals, LINE);
    const body = await readJson(event, scaleSchema);
    return json(await scaleBatch(user, pathId(event.params.id, 'Batch'), body));
  });
