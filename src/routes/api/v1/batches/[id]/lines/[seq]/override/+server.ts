import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { acceptDeviation } from '$lib/server/batches/weighing';
import { overrideLineSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayAcceptDeviation } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Quality accepts an out-of-range reading: { reason, password, version } (the password signs the decision). */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayAcceptDeviation);
    const body = await readJson(event, overrideLineSchema);
    await acceptDeviation(user, idParam(event.params.id, 'Batch was not found.'), idParam(event.params.seq, 'Line was not found.'), body);
    return json({ accepted: true });
  });
