/**
 * The one wrapper of every `+server.ts` under /api: runs the handler and turns whatever it throws
 * into the product's error body `{ error, issues? }` — a domain error by its kind
 * (./status.ts), a zod error as 400 with its issues, SvelteKit's `error()` (sign-in, role) with its
 * status, an outage of the database or the file storage as a logged 503 naming it (./outage.ts),
 * anything else as a logged 500.
 */
import { isHttpError, isRedirect, json } from '@sveltejs/kit';
import { ZodError } from 'zod';
import { DomainError } from '../../errors/domain-error';
import { DB_UNAVAILABLE, logOutage, outageOf, RETRY_AFTER } from './outage';
import { describeIssues, issueSummary } from './issues';
import { errorBody, refusalOf } from './status';

export { DB_UNAVAILABLE };
export const UNEXPECTED = 'Something went wrong on our side. The error has been logged.';

/** The answer to a thrown error (also used by streamed answers, which write it as a line). */
export function errorAnswer(err: unknown): { status: number; body: ReturnType<typeof errorBody>; headers?: Record<string, string> } {
  const outage = outageOf(err);
  if (outage === 'file storage') return { ...refusalOf(err as DomainError), headers: RETRY_AFTER }; // logged where it happened
  if (err instanceof DomainError) return refusalOf(err);
  if (err instanceof ZodError) {
    const issues = describeIssues(err);
    return { status: 400, body: errorBody(`Invalid request: ${issueSummary(issues)}`, issues) };
  }
  if (isHttpError(err)) {
    const { message, reason } = err.body;
    return { status: err.status, body: errorBody(reason ? `${message}: ${reason}` : message) };
  }
  if (outage === 'database') {
    logOutage('database', err, 'API');
    return { status: 503, body: errorBody(DB_UNAVAILABLE), headers: RETRY_AFTER };
  }
  console.error('[phosforge] unexpected API error', err instanceof Error ? err.stack : err);
  return { status: 500, body: errorBody(UNEXPECTED) };
}

export async function apiHandler(run: () => Promise<Response> | Response): Promise<Response> {
  try {
    return await run();
  } catch (err) {
    if (isRedirect(err)) throw err;
    const { status, body, headers } = errorAnswer(err);
    return json(body, { status, headers });
  }
}
