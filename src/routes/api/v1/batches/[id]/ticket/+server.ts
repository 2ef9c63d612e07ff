import { requireUser } from '$lib/server/auth/require';
import { ApiError } from '$lib/server/api/body';
import { batchApi, pathId, pdfResponse } from '$lib/server/batches/api';
import { batchTicketPdf } from '$lib/server/batches/documents';
import { paperSchema } from '$lib/schemas/batches';
import type { RequestHandler } from './$types';

/** The printable weigh-out ticket (PDF); ?paper=A4 (default) or LETTER. */
export const GET: RequestHandler = (event) =>
  batchApi(async () => {
    requireUser(event.locals);
    const paper = paperSchema.safeParse(event.url.searchParams.get('paper') ?? undefined);
    if (!paper.success) throw new ApiError(400, 'paper must be A4 or LETTER');
    const { pdf, batchNumber } = await batchTicketPdf(pathId(event.params.id, 'Batch'), paper.data);
    return pdfResponse(pdf, `${batchNumber}-ticket-${paper.data.toLowerCase()}.pdf`);
  });
