import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi, pathId } from '$lib/server/batches/api';
import { acceptDeviation } from '$lib/server/batches/weighing';
import { QUALITY } from '$lib/access/routes/shared';
import { overrideLineSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** Quality accepts an out-of-range reading: { reason, password, version } (the password signs the decision). */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const body = await readJson(event, overrideLineSchema);
    await acceptDeviation(user, pathId(event.params.id, 'Batch'), pathId(event.params.seq, 'Line'), body);
    return json({ accepted: true });
  });
