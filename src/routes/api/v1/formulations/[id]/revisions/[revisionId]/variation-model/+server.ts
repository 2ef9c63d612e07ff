import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayRead, maySetVariationModel } from '$lib/access/policies';
import { variationModelSchema } from '$lib/blend/spread/model';
import { revisionFromPath } from '$lib/server/formulations/api';
import { getRevisionVariationModel, putRevisionVariationModel } from '$lib/server/yield-predictions/variation-model';
import type { RequestHandler } from './$types';

const putSchema = z
  .object({
    version: z.number().int().min(0, 'version: the version you read (0 while the defaults are in force)'),
    model: variationModelSchema
  })
  .strict();

/** The revision's variation model for yield forecasts: read (defaults while none is kept), or replace (stale version → 409). */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    return finiteJson(await getRevisionVariationModel((await revisionFromPath(event.params)).id));
  });

export const PUT: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, maySetVariationModel);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, putSchema);
    await putRevisionVariationModel(user, rev.id, { model: body.model, version: body.version });
    return finiteJson(await getRevisionVariationModel(rev.id));
  });
