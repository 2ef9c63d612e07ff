import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { markMixed } from '$lib/server/batches/weighing';
import { mixSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayWeigh } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Notes when part B was mixed in ({ version, mixedAt? }, default now) → the slurry's use-before time. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayWeigh);
    const body = await readJson(event, mixSchema);
    return json(await markMixed(user, idParam(event.params.id, 'Batch was not found.'), body));
  });
