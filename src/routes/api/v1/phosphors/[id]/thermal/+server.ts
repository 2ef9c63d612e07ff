import { thermalApi } from '$lib/server/library/thermal-api';
import type { RequestHandler } from './$types';

/** Thermal data of one phosphor: read, replace (body names the thermal version read; stale → 409), or upload a CSV. */
const handlers = thermalApi('phosphor');
export const GET: RequestHandler = handlers.GET;
export const PUT: RequestHandler = handlers.PUT;
export const POST: RequestHandler = handlers.POST;
