import { requireUser } from '$lib/server/auth/require';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayRead } from '$lib/access/policies';
import { tm27Response, uploadSpectraTm27 } from '$lib/server/spectrum-exchange/tm27-export';
import type { RequestHandler } from './$types';

/** The parts of one measurement upload as an IES TM-27-14 document, one SpectralDistribution per part. */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    const message = 'No such measurement upload of this batch.';
    return tm27Response(await uploadSpectraTm27(idParam(event.params.batchId, message), idParam(event.params.uploadId, message)));
  });
