import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi } from '$lib/server/batches/api';
import { prepareBatch } from '$lib/server/batches/create';
import { createBatchSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** The weigh-out plan a create request would give, without saving anything. */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    requireUser(event.locals);
    const { plan, input } = await prepareBatch(await readJson(event, createBatchSchema));
    return json({ plan, weighoutInput: input });
  });
