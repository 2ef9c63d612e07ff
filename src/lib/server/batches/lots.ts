/**
 * Lot check for a weighed line: a line of a library material must name a known lot of that
 * material (material_lots), not past its expiry date. Lines without a library material (silicone
 * parts, additives) keep the lot as typed.
 */
import type { Knex } from 'knex';
import { invalid } from './errors';

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
  const lot = await trx('material_lots').where({ material_id: line.material_id, lot_number: text }).first('id', 'lot_number', 'expires_on');
  if (!lot) {
    const known: { lot_number: string }[] = await trx('material_lots')
      .where({ material_id: line.material_id })
      .orderBy('created_at', 'desc')
      .limit(5)
      .select('lot_number');
    const hint = known.length
      ? ` Known lots: ${known.map((k) => k.lot_number).join(', ')}.`
      : ' No lot of this material is registered yet.';
    throw invalid(`"${text}" is not a known lot of ${line.code}.${hint}`, [
      { path: 'lotNumber', message: `not a known lot of ${line.code}` }
    ]);
  }
  const expires: Date | null = lot.expires_on ? new Date(lot.expires_on) : null;
  if (expires && expires.toISOString().slice(0, 10) < today.toISOString().slice(0, 10)) {
    throw invalid(
      `Lot ${lot.lot_number} of ${line.code} expired on ${expires.toISOString().slice(0, 10)}; use a current lot or have it retested.`,
      [{ path: 'lotNumber', message: 'lot expired' }]
    );
  }
  return { lotId: lot.id, lotNumber: lot.lot_number };
}
