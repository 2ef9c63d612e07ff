/**
 * The one error body of the product, `{ error, issues? }` (issues: `{ path, message }`, with
 * `line` for a file's lines), and a domain error's status (the kind → status map is
 * src/lib/errors/http-status.ts).
 */
import type { DomainError, Issue } from '../../errors/domain-error';
import { STATUS_OF_KIND } from '../../errors/http-status';

export { STATUS_OF_KIND };

export interface ErrorBody {
  error: string;
  issues?: Issue[];
}

export function statusOf(err: DomainError): number {
  return STATUS_OF_KIND[err.kind];
}

export function errorBody(message: string, issues: readonly Issue[] = []): ErrorBody {
  return issues.length ? { error: message, issues: [...issues] } : { error: message };
}

/** A domain error as `{ status, body }`, the form both JSON answers and streamed error lines use. */
export function refusalOf(err: DomainError): { status: number; body: ErrorBody } {
  return { status: statusOf(err), body: errorBody(err.publicMessage, err.issues) };
}
