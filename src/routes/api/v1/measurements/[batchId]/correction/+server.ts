import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { QUALITY } from '$lib/access/routes/shared';
import { correctionSchema } from '$lib/schemas/quality';
import { batchIdParam, qualityApi } from '$lib/server/quality/api';
import { makeCorrectionDraft } from '$lib/server/quality/correction';
import type { RequestHandler } from './$types';

/** Corrected ratios from the measured mean → a new draft revision linked to the batch; { stepFraction? }. */
export const POST: RequestHandler = (event) =>
  qualityApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const batchId = batchIdParam(event.params.batchId);
    const body = await readJson(event, correctionSchema);
    return json(await makeCorrectionDraft(user, batchId, body.stepFraction, event.url.origin), { status: 201 });
  });
