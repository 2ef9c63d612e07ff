import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import * as records from '../../../src/lib/server/library/records';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { demoUser, phosphorFields, removeTestMaterials } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

let rhea: User;
let sam: User;

describe('material edits: optimistic lock, kind rules, audit', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    sam = { ...(await demoUser('admin')) };
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('creates a phosphor at version 1 with an audit event', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-E1'));
    const m = await records.get(id);
    expect(m).toMatchObject({ code: 'TST-E1', version: 1, iqe: 0.9, createdBy: rhea.id });
    const events = await db()('audit_events').where({ entity_type: 'material', entity_id: String(id), action: 'create' });
    expect(events).toHaveLength(1);
  });

  it('refuses a stale edit with 409 and keeps the newer values', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-E2'));
    // Two people open version 1; the first saves, the second saves later from the same version.
    const v2 = await editing.update(rhea, id, 1, { costPerKg: 160 });
    expect(v2).toBe(2);
    const stale = editing.update(sam, id, 1, { costPerKg: 999, notes: 'overwrite attempt' });
    await expect(stale).rejects.toBeInstanceOf(DomainError);
    await expect(editing.update(sam, id, 1, { costPerKg: 999 })).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/changed by someone else.*version 1.*version 2/)
    });
    const row = (await db()('materials').where({ id }).first())!;
    expect(Number(row.cost_per_kg)).toBe(160);
    expect(row.notes).toBeNull();
    expect(row.version).toBe(2);
    expect(row.updated_by).toBe(rhea.id);
  });

  it('records only the changed fields in the audit trail', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-E3'));
    await editing.update(rhea, id, 1, { iqe: 0.88, name: 'TST-E3 test garnet' });
    const ev = (await db()('audit_events')
      .where({ entity_type: 'material', entity_id: String(id), action: 'update' })
      .first())!;
    expect(JSON.parse(ev.before_json!)).toEqual({ iqe: 0.9 });
    expect(JSON.parse(ev.after_json!)).toEqual({ iqe: 0.88 });
  });

  it('requires an IQE for a phosphor but not for a pump', async () => {
    await expect(editing.create(rhea, 'phosphor', { ...phosphorFields('TST-E4'), iqe: null })).rejects.toMatchObject({
      status: 400,
      message: expect.stringMatching(/IQE is required/)
    });
    expect(await db()('materials').where({ code: 'TST-E4' }).first()).toBeUndefined();
    const id = await editing.create(rhea, 'pump', { ...phosphorFields('TST-E5'), iqe: null });
    expect((await records.get(id))?.kind).toBe('pump');
  });

  it('refuses a second material with the same code (409)', async () => {
    await expect(editing.create(rhea, 'phosphor', phosphorFields('TST-E1'))).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/TST-E1 is already used/)
    });
  });

  it('archives (read-only until restored) and restores', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-E6'));
    const v = await editing.setArchived(rhea, id, 1, true);
    await expect(editing.update(rhea, id, v, { costPerKg: 1 })).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/archived/)
    });
    expect((await records.list({ kind: 'phosphor', search: 'TST-E6' })).length).toBe(0);
    expect((await records.list({ kind: 'phosphor', search: 'TST-E6', includeArchived: true })).length).toBe(1);
    const v2 = await editing.setArchived(rhea, id, v, false);
    expect(await editing.update(rhea, id, v2, { costPerKg: 1 })).toBe(v2 + 1);
  });
});
