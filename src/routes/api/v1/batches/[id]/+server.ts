import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ApiError } from '$lib/server/api/body';
import { batchApi, batchJson, pathId } from '$lib/server/batches/api';
import { getBatch } from '$lib/server/batches/read';
import type { RequestHandler } from './$types';

/** One batch with its lines (targets, ranges, readings, lots, decisions). */
export const GET: RequestHandler = (event) =>
  batchApi(async () => {
    requireUser(event.locals);
    const d = await getBatch(pathId(event.params.id, 'Batch'));
    if (!d) throw new ApiError(404, 'Batch was not found.');
    return json(batchJson(d));
  });
