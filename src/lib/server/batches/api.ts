/** Helpers of the batch endpoints: refusals as JSON errors, ids from the path, JSON views of records. */
import { json } from '@sveltejs/kit';
import { ApiError, handleApi } from '../api/body';
import { BatchError } from './errors';
import type { BatchDetail } from './read';

/** Runs an endpoint; BatchError becomes a JSON error with its status and issues. */
export function batchApi(run: () => Promise<Response>): Promise<Response> {
  return handleApi(async () => {
    try {
      return await run();
    } catch (err) {
      if (err instanceof BatchError) throw new ApiError(err.status, err.message, err.issues.length ? err.issues : undefined);
      throw err;
    }
  });
}

export function pathId(value: string | undefined, what: string): number {
  const n = Number(value);
  if (!Number.isSafeInteger(n) || n <= 0) throw new ApiError(404, `${what} was not found.`);
  return n;
}

/** The batch as the API returns it (revision content left out: GET it from the formulations API). */
export function batchJson(d: BatchDetail) {
  const { input, ...batch } = d.batch;
  return {
    ...batch,
    weighoutInput: input,
    revision: d.revision ? { id: d.revision.id, formulationCode: d.revision.formulationCode, revisionNo: d.revision.revisionNo, state: d.revision.state } : null,
    silicone: d.silicone,
    lines: d.lines
  };
}

export const pdfResponse = (pdf: Buffer, fileName: string, disposition: 'attachment' | 'inline' = 'attachment') =>
  new Response(new Uint8Array(pdf), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `${disposition}; filename="${fileName}"`, 'cache-control': 'no-store' }
  });

export { json };
