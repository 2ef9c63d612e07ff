/** Applies the state machine's rules in the server layer: wrong state → 409, wrong person or role → 403. */
import type { Role } from '../../roles';
import { COMMAND_RULES, refusal, type RevisionCommand } from '../../formulations/workflow-rules';
import type { RevisionState } from '../../formulations/workflow-rules';
import { ConflictError, PermissionError } from './errors';

export interface Caller {
  id: number;
  name: string;
  email: string;
  roles: readonly Role[];
}

export function enforce(command: RevisionCommand, caller: Caller, rev: { state: RevisionState; createdBy: number; version: number }): void {
  const reason = refusal(command, caller, rev);
  if (reason === null) return;
  if (!COMMAND_RULES[command].from.includes(rev.state)) throw new ConflictError(reason, { version: rev.version, state: rev.state });
  throw new PermissionError(reason);
}

export function requireRoles(caller: Caller, roles: readonly Role[], what: string): void {
  if (!roles.some((r) => caller.roles.includes(r))) throw new PermissionError(`${what} needs one of the roles: ${roles.join(', ')}.`);
}

/** Refuses a stale edit or transition: the caller read `expected`, the row is now at `actual`. */
export function checkVersion(expected: number | undefined, actual: number, state: string): void {
  if (expected === undefined || expected === actual) return;
  throw new ConflictError(
    `Someone changed this revision after you opened it (you have version ${expected}, it is now version ${actual}). ` +
      'Nothing was saved; your input is kept — reload the revision, then apply your change again.',
    { version: actual, state }
  );
}
