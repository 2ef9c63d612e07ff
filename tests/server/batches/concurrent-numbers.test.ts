/**
 * Fifty batches planned at the same instant from one revision: every one is saved, with its own
 * number, and the numbers of the day follow on without a gap. Before the counter row, the range
 * lock of `SELECT … FOR UPDATE` on batches deadlocked pairs of such requests.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { batchNumberPrefix } from '../../../src/lib/server/batches/number';
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
});
