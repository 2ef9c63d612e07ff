import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { recordLine } from '$lib/server/batches/weighing';
import { recordLineSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayWeigh } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Records a line's balance reading and lot: { actualG, lotNumber, version } → the range check. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayWeigh);
    const id = idParam(event.params.id, 'Batch was not found.');
    const seq = idParam(event.params.seq, 'Line was not found.');
    const body = await readJson(event, recordLineSchema);
    return json(await recordLine(user, id, seq, body));
  });
