/**
 * The one way a form action fails: `fail(status, data)` with the person's input kept for the
 * form and secrets (passwords) stripped from it. Given a thrown error instead of a status, a
 * domain error becomes a failure with its status (./status.ts), its message as `error`, its
 * `issues`, and `conflict` when the record moved on — added to `data`, or handed to `data` when
 * it is a function (for forms that show a refusal under their own keys). Any other error is
 * thrown on (a 500 page, logged).
 */
import { fail, type ActionFailure } from '@sveltejs/kit';
import { DomainError, type Issue } from '../../errors/domain-error';
import { statusOf } from './status';

const SECRET_KEY = /password|secret/i;

type Data = Record<string, unknown>;

/** What a refused service call tells the form. */
export interface Refusal {
  error: string;
  issues: Issue[];
  /** The record moved on (stale version, locked state): reload, then try again. */
  conflict: boolean;
}

function isPlainObject(value: unknown): value is Data {
  return typeof value === 'object' && value !== null && Object.getPrototypeOf(value) === Object.prototype;
}

/** `data` without secret fields, also one level down (`values: { password }`). */
export function withoutSecrets<T extends Data>(data: T): T {
  const out: Data = {};
  for (const [key, value] of Object.entries(data)) {
    if (SECRET_KEY.test(key)) continue;
    out[key] = isPlainObject(value) ? withoutSecrets(value) : value;
  }
  return out as T;
}

export function actionFailure<T extends Data>(status: number, data: T): ActionFailure<T>;
export function actionFailure<T extends Data>(cause: unknown, shown: (refusal: Refusal) => T): ActionFailure<T>;
export function actionFailure<T extends Data>(cause: unknown, data: T): ActionFailure<T & Refusal>;
export function actionFailure<T extends Data>(
  cause: unknown,
  data: T | ((refusal: Refusal) => T)
): ActionFailure<T> | ActionFailure<T & Refusal> {
  if (typeof cause === 'number' && typeof data !== 'function') return fail(cause, withoutSecrets(data));
  if (!(cause instanceof DomainError)) throw cause;
  const refusal: Refusal = { error: cause.publicMessage, issues: [...cause.issues], conflict: cause.kind === 'conflict' };
  if (typeof data === 'function') return fail(statusOf(cause), withoutSecrets(data(refusal)));
  return fail(statusOf(cause), { ...withoutSecrets(data), ...refusal });
}

/** Runs a service call of an action: its result, or its refusal as a form failure carrying `data`. */
export async function tryAction<R, T extends Data>(data: T, run: () => Promise<R>): Promise<R | ActionFailure<T & Refusal>> {
  try {
    return await run();
  } catch (err) {
    return actionFailure(err, data);
  }
}
