import { item } from '$lib/server/library/api';
import type { RequestHandler } from './$types';

/** One pump: read (with spectra and metrics), edit (body names the version read; stale → 409), delete (refused while used). */
const handlers = item('pump');
export const GET: RequestHandler = handlers.GET;
export const PUT: RequestHandler = handlers.PUT;
export const DELETE: RequestHandler = handlers.DELETE;
