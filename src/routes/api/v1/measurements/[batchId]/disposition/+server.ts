import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { dispositionSchema } from '$lib/measurements/schema';
import { disposeBatch } from '$lib/server/measurements/disposition';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Release or reject with an e-signature: { decision, meaning, comment, password, version }. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    const body = await readJson(event, dispositionSchema);
    const out = await disposeBatch(user, batchId, body, event.url.origin);
    return json({ ...out, signedAt: out.signedAt.toISOString() }, { status: 201 });
  });
