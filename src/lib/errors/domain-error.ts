/**
 * The one error type of Phosforge's services and pure modules: a refusal with a `kind` that says
 * what went wrong in the caller's terms, a message a person can act on, and optional field
 * issues. Pure (no framework, no I/O), so the spectral core and the blend model may throw it or
 * subclass it. The kind's HTTP status comes from the one map in ./http-status.ts.
 */
import { STATUS_OF_KIND } from './http-status';

export const ERROR_KINDS = [
  'invalid',
  'forbidden',
  'not_found',
  'conflict',
  'too_large',
  'unsupported_type',
  'unprocessable',
  'unavailable'
] as const;
export type ErrorKind = (typeof ERROR_KINDS)[number];

/** One problem with one field (`path`, by its label or dotted name) or one line of an uploaded file. */
export interface Issue {
  path: string;
  message: string;
  /** Line of an uploaded file the problem is on (null: the file as a whole). */
  line?: number | null;
}

export interface DomainErrorOptions {
  issues?: readonly Issue[];
  /** Words put before the message in an answer ("Spectrum rejected"), when the message alone lacks context. */
  title?: string;
}

export class DomainError extends Error {
  override name = 'DomainError';
  readonly issues: readonly Issue[];
  readonly title: string | undefined;

  constructor(
    readonly kind: ErrorKind,
    message: string,
    options: DomainErrorOptions = {}
  ) {
    super(message);
    this.issues = options.issues ?? [];
    this.title = options.title;
  }

  /** The HTTP status of this kind of refusal (./http-status.ts). */
  get status(): number {
    return STATUS_OF_KIND[this.kind];
  }

  /** The message as answered to the caller (with the title, if any). */
  get publicMessage(): string {
    return this.title ? `${this.title}: ${this.message}` : this.message;
  }
}

/** An issue on a line of an uploaded file (`line` null: the file as a whole). */
export function lineIssue(line: number | null, message: string): Issue {
  return { path: line === null ? '(file)' : `line ${line}`, line, message };
}

export const invalid = (message: string, issues: readonly Issue[] = []) => new DomainError('invalid', message, { issues });
export const forbidden = (message: string, issues: readonly Issue[] = []) => new DomainError('forbidden', message, { issues });
export const notFound = (message: string) => new DomainError('not_found', message);
export const conflict = (message: string) => new DomainError('conflict', message);
export const tooLarge = (message: string) => new DomainError('too_large', message);
export const unsupportedType = (message: string) => new DomainError('unsupported_type', message);
export const unprocessable = (message: string, issues: readonly Issue[] = []) => new DomainError('unprocessable', message, { issues });
export const unavailable = (message: string) => new DomainError('unavailable', message);
