/**
 * The one parser of id route parameters (and id query values). An id is a positive integer
 * written in plain digits; anything else — empty, "-1", "0", "1.5", "1e3", "abc", past
 * Number.MAX_SAFE_INTEGER — names no record, so the route answers 404 (never NaN or -1 downstream).
 */
import { error } from '@sveltejs/kit';

const DIGITS = /^[1-9][0-9]*$/;

/** The id, or null when `raw` is not a positive integer. */
export function parseId(raw: string | null | undefined): number | null {
  if (typeof raw !== 'string' || !DIGITS.test(raw)) return null;
  const id = Number(raw);
  return Number.isSafeInteger(id) ? id : null;
}

/**
 * The id of a route parameter, or a 404 with `notFoundMessage` (SvelteKit's `error`, so pages show
 * their 404 page and apiHandler answers `{ error }` with 404).
 */
export function idParam(raw: string | null | undefined, notFoundMessage = 'Not found.'): number {
  const id = parseId(raw);
  if (id === null) error(404, notFoundMessage);
  return id;
}
