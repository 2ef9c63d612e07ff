import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { mix, mixRequestSchema } from '$lib/blend';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** Ratios (optical fractions or wt % with the loading model) → SPD, metrics and sensitivities. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, mixRequestSchema);
    return finiteJson(mix(body.components, body.ratios));
  });
