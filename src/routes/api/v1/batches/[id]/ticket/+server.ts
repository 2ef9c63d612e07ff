import { requireUser } from '$lib/server/auth/require';
import { pdfResponse } from '$lib/server/batches/api';
import { batchTicketPdf } from '$lib/server/batches/documents';
import { paperSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { invalid } from '$lib/errors/domain-error';
import type { RequestHandler } from './$types';

/** The printable weigh-out ticket (PDF); ?paper=A4 (default) or LETTER. */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const paper = paperSchema.safeParse(event.url.searchParams.get('paper') ?? undefined);
    if (!paper.success) throw invalid('paper must be A4 or LETTER');
    const { pdf, batchNumber } = await batchTicketPdf(idParam(event.params.id, 'Batch was not found.'), paper.data);
    return pdfResponse(pdf, `${batchNumber}-ticket-${paper.data.toLowerCase()}.pdf`);
  });
