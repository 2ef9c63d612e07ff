/**
 * The one map from a domain error's kind to its HTTP status (RFC 9110 §15). Pure data, so a
 * DomainError can tell its own status; the server's wrappers (src/lib/server/http/) read it from here.
 */
import type { ErrorKind } from './domain-error';

export const STATUS_OF_KIND: Readonly<Record<ErrorKind, number>> = {
  invalid: 400,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported_type: 415,
  unprocessable: 422,
  unavailable: 503
};
