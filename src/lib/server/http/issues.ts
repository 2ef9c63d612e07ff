/**
 * zod issues as `{ path, message }` pairs (the issues of the error body: the path for programs, the
 * message as a sentence) and as one line a person reads (field labels, ../../errors/readable-issues.ts).
 */
import type { z } from 'zod';
import type { Issue } from '../../errors/domain-error';
import { readableSummary, sentence } from '../../errors/readable-issues';

export function describeIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => {
    const path = i.path.join('.') || '(body)';
    return { path, message: sentence(i.message, path) };
  });
}

/** The one-line summary of zod issues used as an error message: "Batch mass: must be more than 0". */
export function issueSummary(issues: readonly Issue[]): string {
  return readableSummary(issues);
}
