import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { QUALITY } from '$lib/access/routes/shared';
import { acceptanceSchema } from '$lib/schemas/quality';
import { batchIdParam, qualityApi } from '$lib/server/quality/api';
import { setAcceptance } from '$lib/server/quality/acceptance';
import type { RequestHandler } from './$types';

/** Colour acceptance for the batch: { mode: "revision" | "steps", steps?, requireTargetBin, version } (409 when stale). */
export const PUT: RequestHandler = (event) =>
  qualityApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const batchId = batchIdParam(event.params.batchId);
    const body = await readJson(event, acceptanceSchema);
    return json(await setAcceptance(user, batchId, body));
  });
