/** Shared plumbing of the /api/v1/formulations endpoints: the revision named by the path, list queries. */
import { z } from 'zod';
import { readQuery } from '../api/body';
import { idParam } from '../http/id-param';
import { NotFoundError } from './errors';
import { getRevision } from './read';

export const versionField = z.number().int().positive('version: the version you read (a positive integer)');

/** The revision named by the path, which must belong to the formulation named by the path. */
export async function revisionFromPath(params: { id?: string; revisionId?: string }) {
  const formulationId = idParam(params.id, `Formulation ${params.id} does not exist.`);
  const revisionId = idParam(params.revisionId, `Revision ${params.revisionId} does not exist.`);
  const rev = await getRevision(revisionId);
  if (!rev || rev.formulationId !== formulationId)
    throw new NotFoundError(`Revision ${revisionId} of formulation ${formulationId} does not exist.`);
  return rev;
}

/** Query-string list parameters for the API: bad values are a 400, not a silent default. */
export function apiListQuery<S extends z.ZodType>(schema: S, params: URLSearchParams, fixed: Record<string, unknown> = {}): z.infer<S> {
  return readQuery(params, schema, fixed);
}
