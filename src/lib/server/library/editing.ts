/**
 * Create, edit (optimistic lock on `version`), archive/restore and delete library materials.
 * Every change runs in one transaction with its audit event.
 */
import type { Knex } from 'knex';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { deleteStoredObject } from '../storage/objects';
import { kindIssues, type MaterialFieldsInput } from '../../library/schema';
import { conflict, invalid } from '../../errors/domain-error';
import { notFound, staleVersion } from './errors';
import * as records from './records';
import { deletionRefusal, revisionsUsing } from './usage';
import type { User } from '../accounts/users';
import type { MaterialKind, MaterialFields } from './records';

const actorOf = (u: User) => ({ actorId: u.id, actorEmail: u.email });

function isDuplicate(err: unknown): boolean {
  return (err as { code?: string })?.code === 'ER_DUP_ENTRY';
}

function checkKind(kind: MaterialKind, fields: Partial<MaterialFieldsInput>) {
  const issues = kindIssues(kind, fields);
  if (issues.length)
    throw invalid(
      issues.map((i) => i.message).join(' '),
      issues.map((i) => ({ ...i, line: null }))
    );
}

export async function create(actor: User, kind: MaterialKind, fields: MaterialFieldsInput): Promise<number> {
  checkKind(kind, fields);
  try {
    return await writeTransaction(async (trx) => {
      const [id] = await trx('materials').insert({ kind, ...records.fieldsToColumns(fields), created_by: actor.id, updated_by: actor.id });
      await audit.record({ ...actorOf(actor), entityType: 'material', entityId: id, action: 'create', after: { kind, ...fields } }, trx);
      return id;
    });
  } catch (err) {
    if (isDuplicate(err)) throw conflict(`The code ${fields.code} is already used by another material.`);
    throw err;
  }
}

/** Locks the row, checks it exists, is editable and still at `version`. */
export async function lockForEdit(
  trx: Knex.Transaction,
  id: number,
  version: number | undefined,
  what = 'edited'
): Promise<records.Material> {
  const current = await records.get(id, trx);
  if (!current) throw notFound(id);
  if (version !== undefined && current.version !== version) throw staleVersion(current.version, version);
  if (current.archivedAt) throw conflict(`${current.code} is archived and cannot be ${what}; restore it first.`);
  return current;
}

function changed(before: MaterialFields, after: MaterialFields) {
  const keys = (Object.keys(after) as (keyof MaterialFields)[]).filter((k) => before[k] !== after[k]);
  return { before: Object.fromEntries(keys.map((k) => [k, before[k]])), after: Object.fromEntries(keys.map((k) => [k, after[k]])), keys };
}

/** Applies the given fields (others keep their value). Returns the new version. */
export async function update(actor: User, id: number, version: number, fields: Partial<MaterialFieldsInput>): Promise<number> {
  try {
    return await writeTransaction(async (trx) => {
      const current = await lockForEdit(trx, id, version);
      const beforeFields = records.editableSnapshot(current);
      const merged = { ...beforeFields, ...fields };
      checkKind(current.kind, merged);
      const diff = changed(beforeFields, merged);
      if (diff.keys.length === 0) return current.version;
      const n = await trx('materials')
        .where({ id, version })
        .update({ ...records.fieldsToColumns(fields), version: version + 1, updated_by: actor.id, updated_at: trx.fn.now(3) });
      if (n !== 1) throw staleVersion(current.version + 1, version);
      await audit.record(
        { ...actorOf(actor), entityType: 'material', entityId: id, action: 'update', before: diff.before, after: diff.after },
        trx
      );
      return version + 1;
    });
  } catch (err) {
    if (isDuplicate(err)) throw conflict(`The code ${fields.code} is already used by another material.`);
    throw err;
  }
}

export async function setArchived(actor: User, id: number, version: number, archived: boolean): Promise<number> {
  return writeTransaction(async (trx) => {
    const current = await records.get(id, trx);
    if (!current) throw notFound(id);
    if (current.version !== version) throw staleVersion(current.version, version);
    if (Boolean(current.archivedAt) === archived) return current.version;
    await trx('materials')
      .where({ id, version })
      .update({ archived_at: archived ? trx.fn.now(3) : null, version: version + 1, updated_by: actor.id, updated_at: trx.fn.now(3) });
    await audit.record({ ...actorOf(actor), entityType: 'material', entityId: id, action: archived ? 'archive' : 'restore' }, trx);
    return version + 1;
  });
}

/** Deletes a material with its spectra, lots and files — refused while any formulation revision names it. */
export async function remove(actor: User, id: number): Promise<void> {
  const keys: string[] = [];
  try {
    await writeTransaction(async (trx) => {
      const current = await records.get(id, trx);
      if (!current) throw notFound(id);
      const refusal = deletionRefusal(current.code, await revisionsUsing(id, trx));
      if (refusal) throw conflict(refusal);
      const lotIds = (await trx('material_lots').where({ material_id: id }).select('id')).map((r) => String(r.id));
      const files = await trx('stored_files')
        .where((w) =>
          w
            .where({ entity_type: 'material', entity_id: String(id) })
            .orWhere((o) => o.where('entity_type', 'material-lot').whereIn('entity_id', lotIds))
        )
        .select('id', 'storage_key');
      await trx('materials').where({ id }).update({ emission_spectrum_id: null, excitation_spectrum_id: null });
      await trx('material_spectra').where({ material_id: id }).delete();
      await trx('material_lots').where({ material_id: id }).delete();
      await trx('materials').where({ id }).delete();
      if (files.length)
        await trx('stored_files')
          .whereIn(
            'id',
            files.map((f) => f.id)
          )
          .delete();
      keys.push(...files.map((f) => f.storage_key as string));
      await audit.record(
        {
          ...actorOf(actor),
          entityType: 'material',
          entityId: id,
          action: 'delete',
          before: { kind: current.kind, ...records.editableSnapshot(current) }
        },
        trx
      );
    });
  } catch (err) {
    if ((err as { code?: string })?.code === 'ER_ROW_IS_REFERENCED_2') {
      throw conflict('This material (or one of its lots) is still referenced by other records, such as batch lines. Archive it instead.');
    }
    throw err;
  }
  await Promise.all(keys.map(deleteStoredObject));
}
