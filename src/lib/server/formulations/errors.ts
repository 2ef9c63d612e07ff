/** Typed refusals of the formulation services; routes turn them into 409/400/404/403 answers. */
export class FormulationError extends Error {
  constructor(readonly status: number, message: string) {
    super(message);
  }
}

/** Bad content or form input: nothing was saved. */
export class ValidationError extends FormulationError {
  constructor(message: string, readonly issues: { path: string; message: string }[] = []) {
    super(400, message);
  }
}

/** The record moved on: a stale version, or content that is locked once submitted. */
export class ConflictError extends FormulationError {
  constructor(message: string, readonly current?: { version: number; state: string }) {
    super(409, message);
  }
}

export class NotFoundError extends FormulationError {
  constructor(message: string) {
    super(404, message);
  }
}

/** The caller's role or relation to the revision does not allow the command. */
export class PermissionError extends FormulationError {
  constructor(message: string) {
    super(403, message);
  }
}

/** The e-signature was refused (wrong password): nothing was signed. */
export class SignatureError extends FormulationError {
  constructor(message: string) {
    super(403, message);
  }
}
