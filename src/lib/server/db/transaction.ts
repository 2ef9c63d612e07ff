/**
 * Every write runs here: one database transaction, tried again from the start when InnoDB picks it
 * as a deadlock victim (1213) or a row lock wait times out (1205). On a Galera cluster a write that
 * conflicts with one committed first through another node fails certification and surfaces as the
 * same 1213, at any statement or at COMMIT (MariaDB Galera Cluster, "certification-based
 * replication"). All of these roll the whole transaction back, so running the callback again is safe.
 * Retries back off exponentially with jitter; after the bound the write is refused as a busy
 * database (503, nothing saved) rather than an unexplained error.
 */
import type { Knex } from 'knex';
import { db } from './index';
import { DomainError } from '../../errors/domain-error';

export const WRITE_ATTEMPTS = 8;
const RETRYABLE_ERRNOS = new Set([1213, 1205]);
const RETRYABLE_CODES = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']);

export function isRetryableLockError(err: unknown): boolean {
  const e = (err ?? {}) as { errno?: number; code?: string };
  return RETRYABLE_ERRNOS.has(e.errno ?? 0) || RETRYABLE_CODES.has(e.code ?? '');
}

type Transactor = Pick<Knex, 'transaction'>;

/** Jittered exponential backoff before attempt `n + 1` (n ≥ 1): 5–15 ms, 10–30 ms, 20–60 ms … capped at 160–480 ms. */
const pause = (n: number) => new Promise((r) => setTimeout(r, Math.min(160, 5 * 2 ** (n - 1)) * (1 + 2 * Math.random())));

export const WRITE_CONTENTION =
  'The database was busy with conflicting changes to the same records; nothing was saved. Try again in a moment.';

export async function writeTransaction<T>(fn: (trx: Knex.Transaction) => Promise<T>, k: Transactor = db()): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await k.transaction(fn);
    } catch (err) {
      if (!isRetryableLockError(err)) throw err;
      if (attempt >= WRITE_ATTEMPTS) {
        console.error('[phosforge] write refused after retries:', err instanceof Error ? err.message : err);
        throw new DomainError('unavailable', WRITE_CONTENTION);
      }
      await pause(attempt);
    }
  }
}
