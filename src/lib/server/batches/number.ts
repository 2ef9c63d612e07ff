/** Batch numbers: BT-YYMMDD-NNN, counting up per day (UTC). Short enough for a Code 128 on a label. */
import type { Knex } from 'knex';

export function batchNumberPrefix(now: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `BT-${p(now.getUTCFullYear() % 100)}${p(now.getUTCMonth() + 1)}${p(now.getUTCDate())}-`;
}

export async function nextBatchNumber(trx: Knex.Transaction, now = new Date()): Promise<string> {
  const prefix = batchNumberPrefix(now);
  const last = await trx('batches')
    .where('batch_number', 'like', `${prefix}%`)
    .orderBy('batch_number', 'desc')
    .forUpdate()
    .first('batch_number');
  const n = last ? Number(String(last.batch_number).slice(prefix.length)) + 1 : 1;
  return `${prefix}${String(n).padStart(3, '0')}`;
}
