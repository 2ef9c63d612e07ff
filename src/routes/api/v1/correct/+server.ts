import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { correctBatch, correctionRequestSchema } from '$lib/blend';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** Recipe + measured points or spectra of built parts → corrected ratios and the predicted colour point. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, correctionRequestSchema);
    return finiteJson(correctBatch(body));
  });
