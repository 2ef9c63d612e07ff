/**
 * A signature form that cannot be signed as sent: its problems reported all at once. The password
 * given with it is checked too (and counted, as any signing attempt), so one retry can fix everything.
 */
import type { z } from 'zod';
import { DomainError, invalid } from '../../errors/domain-error';
import type { FormValues } from '../../formulations/form-values';
import type { Caller } from './guard';
import { verifySignaturePassword } from './signature';

export async function signingProblems(user: Caller, revisionId: number, values: FormValues, formError: z.ZodError): Promise<DomainError> {
  const problems = formError.issues.map((i) => i.message);
  const password = values.password ?? '';
  if (password && !formError.issues.some((i) => i.path[0] === 'password')) {
    try {
      await verifySignaturePassword(user, revisionId, values.meaning || '(none chosen)', password);
    } catch (err) {
      if (!(err instanceof DomainError)) throw err;
      problems.unshift(err.message);
    }
  }
  return invalid(
    problems.length === 1 ? problems[0] : `${problems.length} problems: nothing was signed.`,
    problems.map((message) => ({ path: '', message }))
  );
}
