/**
 * Every write runs here: one database transaction, tried again from the start when InnoDB picks it
 * as a deadlock victim (1213) or a row lock wait times out (1205). Both roll the whole transaction
 * back, so running the callback again is safe; after the bound the original error goes up.
 */
import type { Knex } from 'knex';
import { db } from './index';

export const WRITE_ATTEMPTS = 3;
const RETRYABLE_ERRNOS = new Set([1213, 1205]);
const RETRYABLE_CODES = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']);

export function isRetryableLockError(err: unknown): boolean {
  const e = (err ?? {}) as { errno?: number; code?: string };
  return RETRYABLE_ERRNOS.has(e.errno ?? 0) || RETRYABLE_CODES.has(e.code ?? '');
}

type Transactor = Pick<Knex, 'transaction'>;

/** Jittered backoff before attempt `n + 1` (n ≥ 1): 5–15 ms, then 10–30 ms, so two losers do not collide again. */
const pause = (n: number) => new Promise((r) => setTimeout(r, 5 * n * (1 + 2 * Math.random())));

export async function writeTransaction<T>(fn: (trx: Knex.Transaction) => Promise<T>, k: Transactor = db()): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await k.transaction(fn);
    } catch (err) {
      if (attempt >= WRITE_ATTEMPTS || !isRetryableLockError(err)) throw err;
      await pause(attempt);
    }
  }
}
