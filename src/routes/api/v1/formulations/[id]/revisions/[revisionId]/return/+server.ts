import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { revisionFromPath, versionField } from '$lib/server/formulations/api';
import { returnInputSchema, returnRevision } from '$lib/server/formulations/workflow';
import { apiHandler } from '$lib/server/http/api-handler';
import { maySignRevisions } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Submitted → returned, signed, with the reason; the author is notified. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, maySignRevisions);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, returnInputSchema.extend({ version: versionField.optional() }));
    return json(await returnRevision(user, rev.id, body, body.version));
  });
