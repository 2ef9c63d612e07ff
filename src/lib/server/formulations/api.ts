/** Shared plumbing of the /api/v1/formulations endpoints: ids from the path, service errors → JSON. */
import { z } from 'zod';
import { ApiError, handleApi, readQuery } from '../api/body';
import { FormulationError, ValidationError } from './errors';
import { getRevision } from './read';

export const versionField = z.number().int().positive('version: the version you read (a positive integer)');

export function idParam(value: string | undefined, what: string): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) throw new ApiError(404, `${what} ${value} does not exist.`);
  return id;
}

/** Runs an endpoint: service refusals keep their status (400/403/404/409) and reason. */
export function formulationsApi(run: () => Promise<Response>): Promise<Response> {
  return handleApi(async () => {
    try {
      return await run();
    } catch (err) {
      if (err instanceof ValidationError) throw new ApiError(400, err.message, err.issues.length ? err.issues : undefined);
      if (err instanceof FormulationError) throw new ApiError(err.status, err.message);
      throw err;
    }
  });
}

/** The revision named by the path, which must belong to the formulation named by the path. */
export async function revisionFromPath(params: { id?: string; revisionId?: string }) {
  const formulationId = idParam(params.id, 'Formulation');
  const revisionId = idParam(params.revisionId, 'Revision');
  const rev = await getRevision(revisionId);
  if (!rev || rev.formulationId !== formulationId) throw new ApiError(404, `Revision ${revisionId} of formulation ${formulationId} does not exist.`);
  return rev;
}

/** Query-string list parameters for the API: bad values are a 400, not a silent default. */
export function apiListQuery<S extends z.ZodType>(schema: S, params: URLSearchParams, fixed: Record<string, unknown> = {}): z.infer<S> {
  return readQuery(params, schema, fixed);
}
