import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { revisionFromPath, versionField } from '$lib/server/formulations/api';
import { getRevision, listSignatures } from '$lib/server/formulations/read';
import { updateDraft } from '$lib/server/formulations/save';
import { apiHandler } from '$lib/server/http/api-handler';
import { mayActOnRevisions } from '$lib/access/policies';
import type { RequestHandler } from './$types';

const updateSchema = z.object({ version: versionField, content: z.unknown() });

/** One revision with its content, prediction and e-signatures. */
export const GET: RequestHandler = ({ locals, params }) =>
  apiHandler(async () => {
    requireUser(locals);
    const rev = await revisionFromPath(params);
    return json({ ...rev, signatures: await listSignatures(rev.id) });
  });

/** Replaces a draft's content; `version` must be the one read (a stale or locked revision answers 409). */
export const PUT: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayActOnRevisions);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, updateSchema);
    await updateDraft(user, rev.id, body.version, body.content);
    return json(await getRevision(rev.id));
  });
