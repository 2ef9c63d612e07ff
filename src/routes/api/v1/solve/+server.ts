import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { solveProblemSchema } from '$lib/blend';
import { solveOffThread } from '$lib/server/solver/pool';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** Blend problem (components, target, tolerance, floors, objective) → ranked candidates or the reason none exist. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, solveProblemSchema);
    return finiteJson(await solveOffThread(body));
  });
