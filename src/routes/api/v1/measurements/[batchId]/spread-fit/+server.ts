import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { fitSpreadToBatch } from '$lib/server/measurements/fit-spread';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches, maySetVariationModel } from '$lib/access/policies';
import type { RequestHandler } from './$types';

const bodySchema = z
  .object({ version: z.number().int().min(0, "version: the variation model's version you read (0 while the defaults are in force)") })
  .strict();

/** Fits the revision's variation model (slurry-mass CV) to this batch's measured spread; kept for the next forecast. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    requireUser(event.locals, maySetVariationModel);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    const body = await readJson(event, bodySchema);
    return finiteJson(await fitSpreadToBatch(user, batchId, body.version));
  });
