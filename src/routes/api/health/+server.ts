import { json } from '@sveltejs/kit';
import { db } from '$lib/server/db/index';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** App and database status, without sign-in. */
export const GET: RequestHandler = () =>
  apiHandler(async () => {
    const t0 = performance.now();
    let database: 'up' | 'down' = 'up';
    try {
      await db().raw('SELECT 1');
    } catch {
      database = 'down';
    }
    const body = { app: 'up', database, dbLatencyMs: Math.round((performance.now() - t0) * 10) / 10, time: new Date().toISOString() };
    return json(body, { status: database === 'up' ? 200 : 503, headers: { 'cache-control': 'no-store' } });
  });
