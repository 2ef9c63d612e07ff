import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ApiError, finiteJson } from '$lib/server/api/body';
import { QUALITY } from '$lib/access/routes/shared';
import { batchIdParam, ndjsonStream, qualityApi, uploadedFile } from '$lib/server/quality/api';
import { batchResults } from '$lib/server/quality/results';
import { precheckUpload, uploadMeasurements } from '$lib/server/quality/upload';
import type { RequestHandler } from './$types';

/** Results of a batch: parts with metrics and verdicts, summary, prediction check, plot data, disposition. */
export const GET: RequestHandler = (event) =>
  qualityApi(async () => {
    requireUser(event.locals);
    const view = await batchResults(batchIdParam(event.params.batchId));
    if (!view) throw new ApiError(404, `Batch ${event.params.batchId} was not found.`);
    return finiteJson(view);
  });

/** Upload a measurement file (multipart `file`, or a text/csv body). `Accept: application/x-ndjson` streams progress. */
export const POST: RequestHandler = (event) =>
  qualityApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const batchId = batchIdParam(event.params.batchId);
    await precheckUpload(user, batchId);
    const file = await uploadedFile(event.request);
    if (!(event.request.headers.get('accept') ?? '').includes('application/x-ndjson')) {
      return json(await uploadMeasurements(user, batchId, file), { status: 201 });
    }
    return ndjsonStream(async (write) => ({ ...(await uploadMeasurements(user, batchId, file, (p) => write({ type: 'progress', ...p }))) }));
  });
