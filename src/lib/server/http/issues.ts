/** zod issues as `{ path, message }` pairs a person can read (the issues of the error body). */
import type { z } from 'zod';
import type { Issue } from '../../errors/domain-error';

export function describeIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(body)', message: i.message }));
}

/** The one-line summary of zod issues used as an error message. */
export function issueSummary(issues: readonly Issue[]): string {
  return issues.map((i) => `${i.path}: ${i.message}`).join('; ');
}
