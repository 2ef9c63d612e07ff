import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { revisionFromPath, versionField } from '$lib/server/formulations/api';
import { withdraw, withdrawInputSchema } from '$lib/server/formulations/workflow';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayActOnRevisions } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Draft or submitted → withdrawn by its author; approved → withdrawn (retired) by quality. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayActOnRevisions);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, withdrawInputSchema.extend({ version: versionField.optional() }));
    return json(await withdraw(user, rev.id, body.reason, body.version));
  });
