import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { revisionFromPath, versionField } from '$lib/server/formulations/api';
import { submit } from '$lib/server/formulations/workflow';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayActOnRevisions } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Draft → submitted (in review); quality is notified. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayActOnRevisions);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(
      event,
      z.object({ version: versionField.optional(), offAimReason: z.string().trim().max(2000).optional() })
    );
    return json(await submit(user, rev.id, body.version, body.offAimReason));
  });
