import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi, pathId } from '$lib/server/batches/api';
import { markMixed } from '$lib/server/batches/weighing';
import { LINE } from '$lib/access/routes/shared';
import { mixSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** Notes when part B was mixed in ({ version, mixedAt? }, default now) → the slurry's use-before time. */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    const user = requireUser(event.locals, LINE);
    const body = await readJson(event, mixSchema);
    return json(await markMixed(user, pathId(event.params.id, 'Batch'), body));
  });
