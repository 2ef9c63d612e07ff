/**
 * Lot check for a weighed line: a line of a library material must name a known lot of that
 * material (material_lots), not past its expiry date. Lines without a library material (silicone
 * parts, additives) keep the lot as typed.
 */
import type { Knex } from 'knex';
import { invalid } from './errors';
import { db } from '../db/index';
import { lotStanding, type KnownLot } from '../../batches/lot-standing';

export interface CheckedLot {
  lotId: number | null;
  lotNumber: string;
}

export async function checkLot(
  trx: Knex.Transaction,
  line: { material_id: number | null; code: string },
  lotNumber: string,
  today = new Date()
): Promise<CheckedLot> {
  const text = lotNumber.trim();
  if (line.material_id === null) return { lotId: null, lotNumber: text };
  // The typed lot itself decides; the material's other lots are read only to name them in a refusal.
  const lot = await trx('material_lots').where({ material_id: line.material_id, lot_number: text }).first('id', 'lot_number', 'expires_on');
  const known = lot ? [knownLotOf(lot)] : ((await knownLots(trx, [line.material_id])).get(line.material_id) ?? []);
  const standing = lotStanding(text, line.code, known, today.toISOString().slice(0, 10));
  if (!lot) {
    // Not registered: 'unknown', naming the known lots (or 'empty' for a blank lot, said the same way).
    const message = standing.kind === 'unknown' ? standing.message : `"${text}" is not a known lot of ${line.code}.`;
    throw invalid(message, [{ path: 'lotNumber', message: `not a known lot of ${line.code}` }]);
  }
  if (standing.kind === 'expired') throw invalid(standing.message, [{ path: 'lotNumber', message: 'lot expired' }]);
  return { lotId: lot.id, lotNumber: lot.lot_number };
}

const knownLotOf = (r: { lot_number: string; expires_on: Date | string | null }): KnownLot => ({
  lotNumber: r.lot_number,
  expiresOn: r.expires_on === null ? null : new Date(r.expires_on).toISOString().slice(0, 10)
});

/** Registered lots per material, newest first (for the check above and the weighing page's live hint). */
export async function knownLots(k: Knex | Knex.Transaction, materialIds: readonly number[]): Promise<Map<number, KnownLot[]>> {
  const out = new Map<number, KnownLot[]>();
  if (!materialIds.length) return out;
  const rows = await k('material_lots')
    .whereIn('material_id', [...new Set(materialIds)])
    .orderBy('created_at', 'desc')
    .orderBy('id', 'desc')
    .select('material_id', 'lot_number', 'expires_on');
  for (const r of rows as { material_id: number; lot_number: string; expires_on: Date | string | null }[]) {
    const list = out.get(r.material_id) ?? [];
    list.push(knownLotOf(r));
    out.set(r.material_id, list);
  }
  return out;
}

/** Registered lots of these materials, keyed by material id (for pages). */
export async function lotsOfMaterials(materialIds: readonly number[]): Promise<Record<number, KnownLot[]>> {
  return Object.fromEntries(await knownLots(db(), materialIds));
}
