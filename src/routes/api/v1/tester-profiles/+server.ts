import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayJudgeBatches, mayRead } from '$lib/access/policies';
import { testerProfileSchema } from '$lib/tester-table/profile';
import { createTesterProfile, getTesterProfile, listTesterProfiles } from '$lib/server/measurements/tester-profiles';
import type { RequestHandler } from './$types';

/** Every tester profile (how each inline tester's per-part table reads). */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    return finiteJson(await listTesterProfiles());
  });

/** A new tester profile (quality); a name already in use → 409. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const id = await createTesterProfile(user, await readJson(event, testerProfileSchema));
    return finiteJson(await getTesterProfile(id), { status: 201 });
  });
