/**
 * Planning a batch writes the batch row, then its lines, then the audit event, in one
 * transaction. A failure after the batch row (a refused write, or application code that throws
 * between the two inserts) must leave batches, batch_lines and audit_events exactly as they were.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import * as lines from '../../../src/lib/server/batches/lines';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { demoUser, makeFixture, request, type Fixture } from './support';
import { INJECTED, dropLeftoverFaults, failureOf, snapshot, withFailingWrite, type Fault } from '../../support/faults';
import type { User } from '../../../src/lib/server/accounts/users';

const TABLES = ['batches', 'batch_lines', 'audit_events'] as const;
const FAULTS: Fault[] = [
  { label: 'its lines', table: 'batch_lines', event: 'INSERT' },
  { label: 'its audit event', table: 'audit_events', event: 'INSERT', when: "NEW.entity_type = 'batch' AND NEW.action = 'create'" }
];

let fx: Fixture;
let tech: User;
const plan = () => createBatchSchema.parse({ ...request(fx.revisionId), notes: 'rollback test' });

describe('batch planning: a failure after the batch row leaves no partial batch', () => {
  beforeAll(async () => {
    await dropLeftoverFaults();
    fx = await makeFixture();
    tech = await demoUser('technician');
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    await dropLeftoverFaults();
    await closeDb();
  });

  it.each(FAULTS)('fails while writing $label: batches, lines and audit unchanged', async (fault) => {
    const before = await snapshot(TABLES);
    const err = await withFailingWrite(fault, () => failureOf(createBatch(tech, plan())));
    expect(err.message).toContain(INJECTED);
    expect(await snapshot(TABLES)).toEqual(before);
    expect(await db()('batches').where({ revision_id: fx.revisionId }).count({ n: '*' }).first()).toEqual({ n: 0 });
  });

  it('application code throwing between the batch insert and the lines insert saves nothing', async () => {
    const before = await snapshot(TABLES);
    const spy = vi.spyOn(lines, 'lineRowsFor').mockImplementation(() => {
      throw new Error('crash while building the lines (test)');
    });
    try {
      const err = await failureOf(createBatch(tech, plan()));
      expect(err.message).toBe('crash while building the lines (test)');
      // The throw happened inside the transaction, after the batch row was written.
      expect(spy).toHaveBeenCalledTimes(1);
      expect(spy.mock.calls[0][0]).toBeGreaterThan(0);
    } finally {
      spy.mockRestore();
    }
    expect(await snapshot(TABLES)).toEqual(before);
  });

  it('after the failures the same request goes through with its four lines', async () => {
    const { id } = await createBatch(tech, plan());
    // 10:1 silicone with two phosphors: part A, green, red, part B (tests/server/batches/lifecycle.test.ts).
    expect(await db()('batch_lines').where({ batch_id: id }).count({ n: '*' }).first()).toEqual({ n: 4 });
    expect(await db()('batches').where({ revision_id: fx.revisionId }).count({ n: '*' }).first()).toEqual({ n: 1 });
  });
});
