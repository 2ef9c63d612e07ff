import { requireUser } from '$lib/server/auth/require';
import { ApiError } from '$lib/server/api/body';
import { batchApi, pathId, pdfResponse } from '$lib/server/batches/api';
import { batchRecordPdf } from '$lib/server/batches/documents';
import { getBatch } from '$lib/server/batches/read';
import { getFile } from '$lib/server/storage/objects';
import type { RequestHandler } from './$types';

/**
 * The batch record PDF: the copy stored at completion; before completion (or for a record
 * stored without a file) a copy generated now, which says the batch's current state.
 */
export const GET: RequestHandler = (event) =>
  batchApi(async () => {
    requireUser(event.locals);
    const id = pathId(event.params.id, 'Batch');
    const d = await getBatch(id);
    if (!d) throw new ApiError(404, 'Batch was not found.');
    if (d.batch.recordFileId) {
      const file = await getFile(d.batch.recordFileId);
      if (file) return pdfResponse(file.body, file.row.originalName);
    }
    const { pdf, batchNumber } = await batchRecordPdf(id);
    return pdfResponse(pdf, `${batchNumber}-batch-record-${d.batch.state}.pdf`);
  });
