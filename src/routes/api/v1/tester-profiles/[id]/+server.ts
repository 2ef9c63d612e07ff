import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches, mayRead } from '$lib/access/policies';
import { testerProfileSchema } from '$lib/tester-table/profile';
import { getTesterProfile, updateTesterProfile } from '$lib/server/measurements/tester-profiles';
import type { RequestHandler } from './$types';

const putSchema = z.object({ version: z.number().int().positive('version: the version you read'), profile: testerProfileSchema }).strict();

/** One tester profile: read, or replace (body names the version read; stale → 409). */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    return finiteJson(await getTesterProfile(idParam(event.params.id, `No tester profile ${event.params.id}.`)));
  });

export const PUT: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const id = idParam(event.params.id, `No tester profile ${event.params.id}.`);
    const body = await readJson(event, putSchema);
    await updateTesterProfile(user, id, body.version, body.profile);
    return finiteJson(await getTesterProfile(id));
  });
