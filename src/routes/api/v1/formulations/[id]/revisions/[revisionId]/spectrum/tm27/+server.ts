import { requireUser } from '$lib/server/auth/require';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayRead } from '$lib/access/policies';
import { revisionSpectrumTm27, tm27Response } from '$lib/server/spectrum-exchange/tm27-export';
import type { RequestHandler } from './$types';

/** The revision's predicted SPD as an IES TM-27-14 document. */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    const message = 'No such revision of this formulation.';
    return tm27Response(await revisionSpectrumTm27(idParam(event.params.id, message), idParam(event.params.revisionId, message)));
  });
