import { spectrumTm27 } from '$lib/server/library/api';
import type { RequestHandler } from './$types';

/** The phosphor's current spectrum as an IES TM-27-14 document (?kind=emission|excitation). */
export const GET: RequestHandler = spectrumTm27('phosphor').GET;
