import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { tradeOffRequestSchema } from '$lib/blend/schemas';
import { tradeOffOffThread } from '$lib/server/solver/pool';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/**
 * Trade-off front at a target (bench condition): the best LER for each level of Ra, R9 or Rf with the
 * other floors held, each point with its recipe (src/lib/blend/solver/tradeOff.ts), off the request thread.
 */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, tradeOffRequestSchema);
    return finiteJson(await tradeOffOffThread(body));
  });
