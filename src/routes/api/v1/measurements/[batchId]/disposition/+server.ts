import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { QUALITY } from '$lib/access/routes/shared';
import { dispositionSchema } from '$lib/schemas/quality';
import { batchIdParam, qualityApi } from '$lib/server/quality/api';
import { disposeBatch } from '$lib/server/quality/disposition';
import type { RequestHandler } from './$types';

/** Release or reject with an e-signature: { decision, meaning, comment, password, version }. */
export const POST: RequestHandler = (event) =>
  qualityApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const batchId = batchIdParam(event.params.batchId);
    const body = await readJson(event, dispositionSchema);
    const out = await disposeBatch(user, batchId, body, event.url.origin);
    return json({ ...out, signedAt: out.signedAt.toISOString() }, { status: 201 });
  });
