import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { correctionSchema } from '$lib/measurements/schema';
import { makeCorrectionDraft } from '$lib/server/measurements/correction';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Corrected ratios from the measured mean → a new draft revision linked to the batch; { stepFraction? }. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    const body = await readJson(event, correctionSchema);
    return json(await makeCorrectionDraft(user, batchId, body.stepFraction, event.url.origin), { status: 201 });
  });
