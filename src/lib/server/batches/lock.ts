/** Row locks and version checks shared by the batch commands. */
import type { Knex } from 'knex';
import { conflict, notFound } from './errors';
import type { BatchState } from '../../batches/schema';
import type { BatchLineRow, BatchRow } from '../db/tables';

export type LockedBatch = BatchRow;
export type LockedLine = BatchLineRow;

export async function lockBatch(trx: Knex.Transaction, id: number): Promise<LockedBatch> {
  const row = Number.isSafeInteger(id) && id > 0 ? await trx('batches').where({ id }).forUpdate().first() : undefined;
  if (!row) throw notFound(`Batch ${id}`);
  return row;
}

export async function lockLine(trx: Knex.Transaction, batchId: number, seq: number): Promise<LockedLine> {
  const row =
    Number.isSafeInteger(seq) && seq > 0 ? await trx('batch_lines').where({ batch_id: batchId, seq }).forUpdate().first() : undefined;
  if (!row) throw notFound(`Line ${seq} of this batch`);
  return row;
}

export function expectVersion(row: { version: number }, version: number, what: string): void {
  if (row.version !== version) {
    throw conflict(
      `${what} was changed by someone else since you loaded it (version ${version}, ` +
        `now ${row.version}). Reload and check before trying again.`
    );
  }
}

export function expectState(row: { state: BatchState; batch_number: string }, allowed: BatchState[], action: string): void {
  if (!allowed.includes(row.state)) throw conflict(`Batch ${row.batch_number} is ${row.state}: it cannot ${action}.`);
}
