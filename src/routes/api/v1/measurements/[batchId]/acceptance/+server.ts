import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { acceptanceSchema } from '$lib/measurements/schema';
import { setAcceptance } from '$lib/server/measurements/acceptance';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Colour acceptance for the batch: { mode: "revision" | "steps", steps?, requireTargetBin, version } (409 when stale). */
export const PUT: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    const body = await readJson(event, acceptanceSchema);
    return json(await setAcceptance(user, batchId, body));
  });
