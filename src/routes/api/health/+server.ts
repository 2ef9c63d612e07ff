import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/http/api-handler';
import { databaseStatus } from '$lib/server/health/status';
import type { RequestHandler } from './$types';

/** App and database status, without sign-in. */
export const GET: RequestHandler = () =>
  apiHandler(async () => {
    const { database, dbLatencyMs } = await databaseStatus();
    const body = { app: 'up', database, dbLatencyMs, time: new Date().toISOString() };
    return json(body, { status: database === 'up' ? 200 : 503, headers: { 'cache-control': 'no-store' } });
  });
