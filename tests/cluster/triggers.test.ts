/**
 * The append-only audit trail holds on every node: the triggers that refuse UPDATE and DELETE on
 * audit_events are replicated with the schema and fire on whichever node takes the statement.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../src/lib/server/db/index';
import { NODE_COUNT, nodeDb } from './support';

afterAll(closeDb);

describe('audit triggers on every node', () => {
  for (let n = 1; n <= NODE_COUNT; n++) {
    it(`node ${n} refuses to change or delete an audit event`, async () => {
      const k = nodeDb(n);
      try {
        const row = await k('audit_events').orderBy('id').first('id', 'action');
        if (!row) throw new Error('the seeded cluster has audit events');
        await expect(k('audit_events').where({ id: row.id }).update({ action: 'tampered' })).rejects.toThrow(/append-only/);
        await expect(k('audit_events').where({ id: row.id }).delete()).rejects.toThrow(/append-only/);
        expect((await k('audit_events').where({ id: row.id }).first('action'))?.action).toBe(row.action);
      } finally {
        await k.destroy();
      }
    });
  }
});
