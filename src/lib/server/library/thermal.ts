/**
 * Thermal data of library materials: read, replace (optimistic lock on the thermal row's version,
 * one transaction with its audit event) and CSV upload (checked whole before anything is written).
 * No row means "not characterised"; nothing is ever defaulted to zero quenching or drift.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { conflict, lineIssue, unprocessable } from '../../errors/domain-error';
import { materialThermalSchema, type MaterialThermal } from '../../blend/thermal/schema';
import type { ThermalById } from '../../blend/thermal/hotComponents';
import { parseThermalCsv, type PumpDrift } from '../../library/thermal-csv';
import { lockForEdit } from './editing';
import type { User } from '../accounts/users';

export interface MaterialThermalRecord {
  materialId: number;
  /** null = not characterised. */
  thermal: MaterialThermal | null;
  source: string | null;
  /** 0 while not characterised. */
  version: number;
  updatedAt: Date | null;
}

const staleThermal = (current: number, sent: number) =>
  conflict(
    `The thermal data of this material were changed by someone else since you opened them (you edited version ${sent}, ` +
      `they are now at version ${current}). Nothing was saved: reload, then make your change again.`
  );

export async function getThermal(materialId: number): Promise<MaterialThermalRecord> {
  const row = await db()('material_thermal').where({ material_id: materialId }).first();
  if (!row) return { materialId, thermal: null, source: null, version: 0, updatedAt: null };
  return {
    materialId,
    thermal: materialThermalSchema.parse(JSON.parse(row.data_json)),
    source: row.source,
    version: row.version,
    updatedAt: row.updated_at
  };
}

/** Thermal data by material id (as the blend components name them: String(id)); absent = not characterised. */
export async function thermalByMaterialIds(ids: number[]): Promise<ThermalById> {
  if (ids.length === 0) return {};
  const rows = await db()('material_thermal').whereIn('material_id', ids).select('material_id', 'data_json');
  return Object.fromEntries(rows.map((r) => [String(r.material_id), materialThermalSchema.parse(JSON.parse(r.data_json))]));
}

/** Replaces the material's thermal data; `version` is the thermal version read (0 = none yet). Returns the new version. */
export async function putThermal(actor: User, materialId: number, version: number, thermal: MaterialThermal, source: string | null) {
  return writeTransaction(async (trx) => {
    const material = await lockForEdit(trx, materialId, undefined, 'characterised');
    if (material.kind !== thermal.kind) {
      throw unprocessable(`${material.code} is a ${material.kind}; give ${material.kind} thermal data, not ${thermal.kind} data.`);
    }
    const row = await trx('material_thermal').where({ material_id: materialId }).forUpdate().first();
    const current = row?.version ?? 0;
    if (current !== version) throw staleThermal(current, version);
    const data = JSON.stringify(thermal);
    if (row) {
      await trx('material_thermal')
        .where({ material_id: materialId, version })
        .update({ data_json: data, source, version: version + 1, updated_by: actor.id, updated_at: trx.fn.now(3) });
    } else {
      await trx('material_thermal').insert({ material_id: materialId, data_json: data, source, version: 1, updated_by: actor.id });
    }
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'material',
        entityId: materialId,
        action: 'thermal',
        before: row ? JSON.parse(row.data_json) : null,
        after: thermal
      },
      trx
    );
    return version + 1;
  });
}

/** Checks a thermal CSV (saving nothing on any problem, naming the lines), then stores it. */
export async function uploadThermalCsv(
  actor: User,
  materialId: number,
  kind: 'phosphor' | 'pump',
  version: number,
  file: { name: string; text: string },
  drift?: PumpDrift
) {
  const parsed = parseThermalCsv(kind, file.text, drift);
  if (!parsed.ok) {
    const n = parsed.errors.length;
    throw unprocessable(
      `${file.name} was not saved: ${n === 1 ? 'one problem' : `${n} problems`} in the file. ${parsed.errors[0].message}`,
      parsed.errors.map((e) => lineIssue(e.line, e.message))
    );
  }
  return putThermal(actor, materialId, version, parsed.thermal, file.name.slice(0, 200));
}
