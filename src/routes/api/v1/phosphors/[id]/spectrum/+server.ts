import { spectrumUpload } from '$lib/server/library/api';
import type { RequestHandler } from './$types';

/** Upload a spectrum file for a phosphor (?kind=emission|excitation, ?version=, ?dryRun=1 checks without saving). */
export const POST: RequestHandler = spectrumUpload('phosphor').POST;
