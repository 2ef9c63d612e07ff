import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { formulationsApi, revisionFromPath, versionField } from '$lib/server/formulations/api';
import { submit } from '$lib/server/formulations/workflow';
import type { RequestHandler } from './$types';

/** Draft → submitted (in review); quality is notified. */
export const POST: RequestHandler = (event) =>
  formulationsApi(async () => {
    const user = requireUser(event.locals, ['formulator', 'quality', 'admin']);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, z.object({ version: versionField.optional() }));
    return json(await submit(user, rev.id, body.version));
  });
