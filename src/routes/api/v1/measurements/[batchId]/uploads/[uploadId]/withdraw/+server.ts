import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ApiError, readJson } from '$lib/server/api/body';
import { QUALITY } from '$lib/access/routes/shared';
import { withdrawUploadSchema } from '$lib/schemas/quality';
import { batchIdParam, qualityApi } from '$lib/server/quality/api';
import { withdrawUpload } from '$lib/server/quality/upload';
import type { RequestHandler } from './$types';

/** Takes an upload out of the batch's results (kept on record): { reason }. */
export const POST: RequestHandler = (event) =>
  qualityApi(async () => {
    const user = requireUser(event.locals, QUALITY);
    const batchId = batchIdParam(event.params.batchId);
    const uploadId = Number(event.params.uploadId);
    if (!Number.isSafeInteger(uploadId) || uploadId <= 0) throw new ApiError(404, `Upload ${event.params.uploadId} was not found.`);
    const body = await readJson(event, withdrawUploadSchema.omit({ uploadId: true }));
    await withdrawUpload(user, batchId, uploadId, body.reason);
    return json({ withdrawn: uploadId });
  });
