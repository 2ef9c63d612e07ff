import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { completeBatch } from '$lib/server/batches/complete';
import { completeSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayWeigh } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Completes the weigh-out ({ version }) and stores the batch record PDF. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayWeigh);
    const body = await readJson(event, completeSchema);
    const id = idParam(event.params.id, 'Batch was not found.');
    const done = await completeBatch(user, id, body.version);
    return json({ ...done, recordUrl: `/api/v1/batches/${id}/record` });
  });
