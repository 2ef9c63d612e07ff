/**
 * Fifty batches planned at the same instant from one revision: every one is saved, with its own
 * number, and the numbers of the day follow on without a gap. Before the counter row, the range
 * lock of `SELECT … FOR UPDATE` on batches deadlocked pairs of such requests.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { batchNumberPrefix, ensureBatchCounter, nextBatchNumber } from '../../../src/lib/server/batches/number';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { demoUser, makeFixture, request, type Fixture } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

const N = 50;
let fx: Fixture;
let tech: User;

describe('batch numbers under concurrent planning', () => {
  beforeAll(async () => {
    fx = await makeFixture();
    tech = await demoUser('technician');
  });
  afterAll(async () => {
    await closeDb();
  });

  it(`${N} simultaneous creations give ${N} distinct, consecutive numbers and no error`, async () => {
    const req = createBatchSchema.parse({ ...request(fx.revisionId), notes: 'concurrent numbering test' });
    const results = await Promise.allSettled(Array.from({ length: N }, () => createBatch(tech, req)));
    const failed = results.filter((r) => r.status === 'rejected');
    expect(failed.map((r) => String((r as PromiseRejectedResult).reason))).toEqual([]);
    const numbers = results.map((r) => (r as PromiseFulfilledResult<{ batchNumber: string }>).value.batchNumber);
    expect(new Set(numbers).size).toBe(N);
    const prefix = batchNumberPrefix(new Date());
    const seq = numbers.map((n) => Number(n.slice(prefix.length))).sort((a, b) => a - b);
    expect(seq[N - 1] - seq[0]).toBe(N - 1);
    const saved = await db()('batches').where({ revision_id: fx.revisionId }).count({ n: '*' }).first();
    expect(Number(saved?.n)).toBe(N);
  }, 60_000);

  it('continues the numbers of a day already numbered before its counter row existed', async () => {
    // The demo data numbers BT-261201-001 directly (seeds/04_batches.ts), without a counter row.
    const day = new Date('2026-12-01T09:00:00Z');
    expect(await db()('batches').where({ batch_number: 'BT-261201-001' }).first('id')).toBeTruthy();
    await ensureBatchCounter(day);
    await ensureBatchCounter(day); // once only: a second call changes nothing
    const trx = await db().transaction();
    try {
      expect(await nextBatchNumber(trx, day)).toBe('BT-261201-002');
    } finally {
      await trx.rollback();
    }
  });

  it('starts a day without batches at 001', async () => {
    const day = new Date('2099-03-04T12:00:00Z');
    const trx = await db().transaction();
    try {
      expect(await nextBatchNumber(trx, day)).toBe('BT-990304-001');
      expect(await nextBatchNumber(trx, day)).toBe('BT-990304-002');
    } finally {
      await trx.rollback();
    }
  });

  it('moves a counter left behind the numbers in use past them instead of failing', async () => {
    const req = createBatchSchema.parse({ ...request(fx.revisionId), notes: 'counter catch-up test' });
    await createBatch(tech, req);
    const prefix = batchNumberPrefix(new Date());
    await db()('batch_number_counters').where({ prefix }).decrement('last_no', 3);
    const results = await Promise.allSettled(Array.from({ length: 30 }, () => createBatch(tech, req)));
    expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
  });
});
