import { collection } from '$lib/server/library/api';
import type { RequestHandler } from './$types';

/** List (phosphors of the library; ?q= search, ?sort=, ?dir=, ?archived=1) and create one. */
const handlers = collection('phosphor');
export const GET: RequestHandler = handlers.GET;
export const POST: RequestHandler = handlers.POST;
