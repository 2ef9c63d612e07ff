import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { formulationsApi, revisionFromPath, versionField } from '$lib/server/formulations/api';
import { getRevision, listSignatures } from '$lib/server/formulations/read';
import { updateDraft } from '$lib/server/formulations/save';
import type { RequestHandler } from './$types';

const updateSchema = z.object({ version: versionField, content: z.unknown() });

/** One revision with its content, prediction and e-signatures. */
export const GET: RequestHandler = ({ locals, params }) =>
  formulationsApi(async () => {
    requireUser(locals);
    const rev = await revisionFromPath(params);
    return json({ ...rev, signatures: await listSignatures(rev.id) });
  });

/** Replaces a draft's content; `version` must be the one read (a stale or locked revision answers 409). */
export const PUT: RequestHandler = (event) =>
  formulationsApi(async () => {
    const user = requireUser(event.locals, ['formulator', 'quality', 'admin']);
    const rev = await revisionFromPath(event.params);
    const body = await readJson(event, updateSchema);
    await updateDraft(user, rev.id, body.version, body.content);
    return json(await getRevision(rev.id));
  });
