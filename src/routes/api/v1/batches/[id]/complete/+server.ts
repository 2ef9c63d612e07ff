import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi, pathId } from '$lib/server/batches/api';
import { completeBatch } from '$lib/server/batches/complete';
import { LINE } from '$lib/access/routes/shared';
import { completeSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** Completes the weigh-out ({ version }) and stores the batch record PDF. */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    const user = requireUser(event.locals, LINE);
    const body = await readJson(event, completeSchema);
    const id = pathId(event.params.id, 'Batch');
    const done = await completeBatch(user, id, body.version);
    return json({ ...done, recordUrl: `/api/v1/batches/${id}/record` });
  });
