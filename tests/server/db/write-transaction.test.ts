/**
 * writeTransaction retries a transaction that InnoDB rolled back for a deadlock (1213) or a lock
 * wait timeout (1205), a bounded number of times, and passes every other error through at once.
 * Error numbers: MariaDB server error codes ER_LOCK_DEADLOCK 1213 and ER_LOCK_WAIT_TIMEOUT 1205.
 */
import { describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { WRITE_ATTEMPTS, WRITE_CONTENTION, isRetryableLockError, writeTransaction } from '../../../src/lib/server/db/transaction';
import { DomainError } from '../../../src/lib/errors/domain-error';

const lockError = (errno: number, code: string) => Object.assign(new Error(`${code} (test)`), { errno, code });

/** A stand-in for Knex whose transaction() fails with the given errors first, then runs the callback. */
function fakeKnex(failures: Error[]) {
  let calls = 0;
  const k = {
    transaction: async (fn: (trx: Knex.Transaction) => Promise<unknown>) => {
      const failure = failures[calls++];
      if (failure) throw failure;
      return fn({} as Knex.Transaction);
    }
  } as unknown as Pick<Knex, 'transaction'>;
  return { k, calls: () => calls };
}

describe('writeTransaction', () => {
  it('succeeds on the third attempt after two deadlocks', async () => {
    const { k, calls } = fakeKnex([lockError(1213, 'ER_LOCK_DEADLOCK'), lockError(1213, 'ER_LOCK_DEADLOCK')]);
    expect(await writeTransaction(async () => 'saved', k)).toBe('saved');
    expect(calls()).toBe(3);
  });

  it('retries a lock wait timeout', async () => {
    const { k, calls } = fakeKnex([lockError(1205, 'ER_LOCK_WAIT_TIMEOUT')]);
    expect(await writeTransaction(async () => 7, k)).toBe(7);
    expect(calls()).toBe(2);
  });

  it('gives up after the bound as a busy database (503, nothing saved)', async () => {
    const errors = Array.from({ length: WRITE_ATTEMPTS + 2 }, (_, i) => lockError(1213, `ER_LOCK_DEADLOCK #${i}`));
    const { k, calls } = fakeKnex(errors);
    const refusal = await writeTransaction(async () => 'never', k).catch((e: unknown) => e);
    expect(refusal).toBeInstanceOf(DomainError);
    expect((refusal as DomainError).kind).toBe('unavailable');
    expect((refusal as DomainError).message).toBe(WRITE_CONTENTION);
    expect(calls()).toBe(WRITE_ATTEMPTS);
    // Enough for certification conflicts between Galera nodes on one hot row (tests/cluster); bounded all the same.
    expect(WRITE_ATTEMPTS).toBe(8);
  }, 10_000);

  it('does not retry other errors', async () => {
    const dup = Object.assign(new Error('duplicate (test)'), { errno: 1062, code: 'ER_DUP_ENTRY' });
    const { k, calls } = fakeKnex([dup]);
    await expect(writeTransaction(async () => 'never', k)).rejects.toBe(dup);
    expect(calls()).toBe(1);
  });

  it('recognises the errors by number or by driver code', () => {
    expect(isRetryableLockError({ errno: 1213 })).toBe(true);
    expect(isRetryableLockError({ code: 'ER_LOCK_WAIT_TIMEOUT' })).toBe(true);
    expect(isRetryableLockError({ errno: 1062 })).toBe(false);
    expect(isRetryableLockError(undefined)).toBe(false);
  });
});
