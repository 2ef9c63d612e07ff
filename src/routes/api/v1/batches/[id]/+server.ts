import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { batchJson } from '$lib/server/batches/api';
import { getBatch } from '$lib/server/batches/read';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { notFound } from '$lib/errors/domain-error';
import type { RequestHandler } from './$types';

/** One batch with its lines (targets, ranges, readings, lots, decisions). */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const d = await getBatch(idParam(event.params.id, 'Batch was not found.'));
    if (!d) throw notFound('Batch was not found.');
    return json(batchJson(d));
  });
