import { requireUser } from '$lib/server/auth/require';
import { pdfResponse } from '$lib/server/batches/api';
import { batchRecordPdf } from '$lib/server/batches/documents';
import { getBatch } from '$lib/server/batches/read';
import { getFile } from '$lib/server/storage/objects';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { notFound } from '$lib/errors/domain-error';
import type { RequestHandler } from './$types';

/**
 * The batch record PDF: the copy stored at completion; before completion (or for a record
 * stored without a file) a copy generated now, which says the batch's current state.
 */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const id = idParam(event.params.id, 'Batch was not found.');
    const d = await getBatch(id);
    if (!d) throw notFound('Batch was not found.');
    if (d.batch.recordFileId) {
      const file = await getFile(d.batch.recordFileId);
      if (file) return pdfResponse(file.body, file.row.originalName);
    }
    const { pdf, batchNumber } = await batchRecordPdf(id);
    return pdfResponse(pdf, `${batchNumber}-batch-record-${d.batch.state}.pdf`);
  });
