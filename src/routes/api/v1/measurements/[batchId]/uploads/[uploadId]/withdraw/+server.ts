import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { withdrawUploadSchema } from '$lib/measurements/schema';
import { withdrawUpload } from '$lib/server/measurements/upload';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayJudgeBatches } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/** Takes an upload out of the batch's results (kept on record): { reason }. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    const uploadId = idParam(event.params.uploadId, `Upload ${event.params.uploadId} was not found.`);
    const body = await readJson(event, withdrawUploadSchema.omit({ uploadId: true }));
    await withdrawUpload(user, batchId, uploadId, body.reason);
    return json({ withdrawn: uploadId });
  });
