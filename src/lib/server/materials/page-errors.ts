/** Maps library failures to form failures on pages (values kept, reason shown). */
import { fail, type ActionFailure } from '@sveltejs/kit';
import { MaterialError } from './errors';

export async function formGuard<T, F extends Record<string, unknown>>(extra: F, run: () => Promise<T>): Promise<T | ActionFailure<F & { error: string; details?: { line: number | null; message: string }[] }>> {
  try {
    return await run();
  } catch (err) {
    if (err instanceof MaterialError) {
      return fail(err.status === 404 ? 404 : err.status === 409 ? 409 : 400, { ...extra, error: err.message, ...(err.details ? { details: err.details } : {}) });
    }
    throw err;
  }
}

/** Material id from the route parameter, or a 404 page. */
export function pageId(raw: string): number {
  const id = Number(raw);
  return Number.isInteger(id) && id > 0 ? id : -1;
}
