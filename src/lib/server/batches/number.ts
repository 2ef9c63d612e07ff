/** Batch numbers: BT-YYMMDD-NNN, counting up per day (UTC). Short enough for a Code 128 on a label. */
import type { Knex } from 'knex';
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';

export function batchNumberPrefix(now: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `BT-${p(now.getUTCFullYear() % 100)}${p(now.getUTCMonth() + 1)}${p(now.getUTCDate())}-`;
}

/**
 * Creates the day's counter row from the batches already numbered under the prefix, outside the batch
 * transaction. `resync` also moves an existing counter up to the highest number in use (after a
 * duplicate number was refused). The highest number is a plain read, which locks nothing in
 * `batches`: a locking read there would wait on, and deadlock with, the batch inserts running now.
 */
export async function ensureBatchCounter(now = new Date(), opts: { resync?: boolean } = {}): Promise<void> {
  const prefix = batchNumberPrefix(now);
  if (!opts.resync && (await db()('batch_number_counters').where({ prefix }).first('prefix'))) return;
  const [rows] = (await db().raw(
    'SELECT COALESCE(MAX(CAST(SUBSTRING(batch_number, ?) AS UNSIGNED)), 0) AS n FROM batches WHERE batch_number LIKE ?',
    [prefix.length + 1, `${prefix}%`]
  )) as [{ n: number | string }[]];
  await writeTransaction((trx) =>
    trx.raw(
      `INSERT INTO batch_number_counters (prefix, last_no) VALUES (?, ?)
       ON DUPLICATE KEY UPDATE last_no = GREATEST(last_no, VALUES(last_no))`,
      [prefix, Number(rows[0].n)]
    )
  );
}

/** The next number under today's prefix: one upsert on the counter row, whose lock is held until commit. */
export async function nextBatchNumber(trx: Knex.Transaction, now = new Date()): Promise<string> {
  const prefix = batchNumberPrefix(now);
  // LAST_INSERT_ID(expr) hands the new value back on this connection on both the insert and the update path.
  await trx.raw(
    `INSERT INTO batch_number_counters (prefix, last_no) VALUES (?, LAST_INSERT_ID(1))
     ON DUPLICATE KEY UPDATE last_no = LAST_INSERT_ID(last_no + 1)`,
    [prefix]
  );
  const [rows] = (await trx.raw('SELECT LAST_INSERT_ID() AS n')) as [{ n: number | string }[]];
  return `${prefix}${String(Number(rows[0].n)).padStart(3, '0')}`;
}
