/**
 * A service the app depends on is down: the database or the file storage (S3). One place names
 * the service, logs it and gives the one answer: 503 `{ error }` with Retry-After for the API, a
 * "temporarily unavailable" page for pages and forms (src/hooks.server.ts).
 */
import { json, type Handle, type RequestEvent } from '@sveltejs/kit';
import { isDbUnavailable } from '../db/index';
import { DomainError } from '../../errors/domain-error';
import { errorBody } from './status';

export type Service = 'database' | 'file storage';

export const DB_UNAVAILABLE = 'The database is not reachable; try again shortly.';
export const STORAGE_UNAVAILABLE =
  'File storage is not reachable, so files cannot be saved or read now; nothing was saved. Try again shortly.';
export const OUTAGE_MESSAGE: Record<Service, string> = { database: DB_UNAVAILABLE, 'file storage': STORAGE_UNAVAILABLE };
export const RETRY_AFTER = { 'retry-after': '5' };

/** Marks a refusal made because the file storage is down (see storage/client.ts). */
export class StorageUnavailableError extends DomainError {
  readonly storageCause: unknown;
  constructor(cause: unknown) {
    super('unavailable', STORAGE_UNAVAILABLE);
    this.storageCause = cause;
  }
}

/** Which service an error says is down, or null. */
export function outageOf(err: unknown): Service | null {
  if (err instanceof StorageUnavailableError) return 'file storage';
  if (isDbUnavailable(err)) return 'database';
  return null;
}

/** One log line per outage seen by a request (the product's log: stderr, `[phosforge]` prefix). */
export function logOutage(service: Service, err: unknown, where = ''): void {
  const inner = (err instanceof StorageUnavailableError ? err.storageCause : err) ?? {};
  const e = inner as { code?: string; name?: string; message?: string };
  const detail = [e.code ?? e.name, e.message].filter(Boolean).join(' ');
  console.error(`[phosforge] ${service} unavailable${where ? ` (${where})` : ''}: ${detail}`);
}

/** handleError's part: an outage is logged, remembered for `answerOutages` and shown by name. */
export function noteOutage(err: unknown, event: Pick<RequestEvent, 'locals' | 'request' | 'url'>): App.Error | null {
  const outage = outageOf(err);
  if (!outage) return null;
  event.locals.outage = outage;
  logOutage(outage, err, `${event.request.method} ${event.url.pathname}`);
  return { message: OUTAGE_MESSAGE[outage], outage };
}

/**
 * First hook: a request that failed because a service went down while it ran (noted by
 * handleError) answers 503, never 500 — `{ error }` for the API and JSON, the error page (which
 * already names the service) for pages.
 */
export const answerOutages: Handle = async ({ event, resolve }) => {
  const response = await resolve(event);
  const outage = event.locals.outage;
  if (!outage || response.status !== 500) return response;
  if (event.url.pathname.startsWith('/api/') || (response.headers.get('content-type') ?? '').includes('json')) {
    return json(errorBody(OUTAGE_MESSAGE[outage]), { status: 503, headers: RETRY_AFTER });
  }
  const headers = new Headers(response.headers);
  headers.set('retry-after', RETRY_AFTER['retry-after']);
  return new Response(response.body, { status: 503, statusText: 'Service Unavailable', headers });
};
