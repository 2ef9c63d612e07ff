import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { batchApi, pathId } from '$lib/server/batches/api';
import { recordLine } from '$lib/server/batches/weighing';
import { LINE } from '$lib/access/routes/shared';
import { recordLineSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** Records a line's balance reading and lot: { actualG, lotNumber, version } → the range check. */
export const POST: RequestHandler = (event) =>
  batchApi(async () => {
    const user = requireUser(event.locals, LINE);
    const id = pathId(event.params.id, 'Batch');
    const seq = pathId(event.params.seq, 'Line');
    const body = await readJson(event, recordLineSchema);
    return json(await recordLine(user, id, seq, body));
  });
