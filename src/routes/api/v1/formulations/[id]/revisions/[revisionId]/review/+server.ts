import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { revisionFromPath, versionField } from '$lib/server/formulations/api';
import { sign, signatureInputSchema } from '$lib/server/formulations/workflow';
import { apiHandler } from '$lib/server/http/api-handler';
import { maySignRevisions } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Records an e-signature with the meaning "reviewed"; the revision stays in review. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, maySignRevisions);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, signatureInputSchema.extend({ version: versionField.optional() }));
    return json(await sign(user, rev.id, 'reviewed', body, body.version));
  });
