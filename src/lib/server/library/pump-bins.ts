/**
 * The wavelength bins of a pump material: read, and replace (optimistic lock on the set's version,
 * one transaction with its audit event). No row means the pump has no bins yet.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { conflict, unprocessable } from '../../errors/domain-error';
import { pumpBinSetSchema, type PumpBinSet } from '../../pump-bins/schema';
import { lockForEdit } from './editing';
import type { User } from '../accounts/users';

export interface PumpBinSetRecord {
  materialId: number;
  /** null = no bins entered. */
  set: PumpBinSet | null;
  /** 0 while no bins are entered. */
  version: number;
}

export async function getPumpBins(materialId: number): Promise<PumpBinSetRecord> {
  const row = await db()('pump_bin_sets').where({ material_id: materialId }).first();
  if (!row) return { materialId, set: null, version: 0 };
  return { materialId, set: pumpBinSetSchema.parse(JSON.parse(row.set_json)), version: row.version };
}

/** Replaces the pump's bins; `version` is the version read (0 = none yet). Returns the new version. */
export async function putPumpBins(actor: User, materialId: number, version: number, set: PumpBinSet): Promise<number> {
  return writeTransaction(async (trx) => {
    const material = await lockForEdit(trx, materialId, undefined, 'binned');
    if (material.kind !== 'pump') throw unprocessable(`${material.code} is a ${material.kind}: only pumps have wavelength bins.`);
    const row = await trx('pump_bin_sets').where({ material_id: materialId }).forUpdate().first();
    const current = row?.version ?? 0;
    if (current !== version)
      throw conflict(
        `The bins of ${material.code} were changed by someone else since you opened them (you edited version ${version}, ` +
          `they are now at version ${current}). Nothing was saved: reload, then make your change again.`
      );
    const json = JSON.stringify(set);
    if (row) {
      await trx('pump_bin_sets')
        .where({ material_id: materialId, version })
        .update({ set_json: json, version: version + 1, updated_by: actor.id, updated_at: trx.fn.now(3) });
    } else {
      await trx('pump_bin_sets').insert({ material_id: materialId, set_json: json, version: 1, updated_by: actor.id });
    }
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'material',
        entityId: materialId,
        action: 'pump-bins',
        before: row ? JSON.parse(row.set_json) : null,
        after: set
      },
      trx
    );
    return version + 1;
  });
}
