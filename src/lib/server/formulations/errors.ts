/** Refusals of the formulation services: domain errors of a fixed kind (see ../http/status.ts for their statuses). */
import { DomainError, type Issue } from '../../errors/domain-error';

/** Bad content or form input: nothing was saved. */
export class ValidationError extends DomainError {
  constructor(message: string, issues: Issue[] = []) {
    super('invalid', message, { issues });
  }
}

/** The record moved on: a stale version, or content that is locked once submitted. */
export class ConflictError extends DomainError {
  constructor(
    message: string,
    readonly current?: { version: number; state: string }
  ) {
    super('conflict', message);
  }
}

export class NotFoundError extends DomainError {
  constructor(message: string) {
    super('not_found', message);
  }
}

/** The caller's role or relation to the revision does not allow the command. */
export class PermissionError extends DomainError {
  constructor(message: string) {
    super('forbidden', message);
  }
}

/** The e-signature was refused (wrong password): nothing was signed. */
export class SignatureError extends DomainError {
  constructor(message: string) {
    super('forbidden', message);
  }
}
