import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { evaluateRequestSchema } from '$lib/blend/evaluate-schema';
import { evaluateSpectrum } from '$lib/spectral';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** Spectrum → colorimetry, CCT/Duv, CIE 13.3, TM-30, LER, α-opic (CIE S 026) (the spectral core's evaluateSpectrum). */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, evaluateRequestSchema);
    return finiteJson(evaluateSpectrum(body.spd, body.options ?? {}));
  });
