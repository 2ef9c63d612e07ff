/**
 * Completing a weigh-out: every line read with its lot, every out-of-range reading accepted by
 * quality, part B's mixing time noted. Then the final batch record (PDF) is stored in object
 * storage and the batch becomes `complete` — in one transaction (the stored object is removed
 * again if the transaction fails).
 */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { putFile } from '../storage/objects';
import type { User } from '../accounts/users';
import { buildBatchRecord } from '../pdf/batch-record';
import { conflict } from './errors';
import { expectState, expectVersion, lockBatch } from './lock';
import { getBatch } from './read';
import { toBatchDoc } from './documents';

export async function completeBatch(user: User, batchId: number, version: number): Promise<{ recordFileId: number }> {
  return writeTransaction(async (trx) => {
    const row = await lockBatch(trx, batchId);
    expectVersion(row, version, `Batch ${row.batch_number}`);
    expectState(row, ['weighing'], 'be completed');
    const detail = (await getBatch(batchId, trx))!;
    const missing: string[] = [];
    for (const l of detail.lines) {
      if (l.actualG === null) missing.push(`line ${l.seq} (${l.code}) has no reading`);
      else if (!l.lotNumber) missing.push(`line ${l.seq} (${l.code}) has no lot`);
      else if (l.actualStatus !== 'in' && !l.overrideAt)
        missing.push(`line ${l.seq} (${l.code}) is out of range and needs a quality decision`);
    }
    if (!detail.batch.mixedAt) missing.push('the time part B was mixed in is not noted');
    if (missing.length) throw conflict(`Batch ${row.batch_number} cannot be completed yet: ${missing.join('; ')}.`);

    const completedAt = new Date();
    const doc = toBatchDoc(detail);
    doc.state = 'complete';
    doc.process = { ...doc.process, completedAt, completedBy: user.name };
    const pdf = await buildBatchRecord(doc);
    const recordFileId = await putFile(
      {
        body: pdf,
        originalName: `${row.batch_number}-batch-record.pdf`,
        contentType: 'application/pdf',
        purpose: 'batch-record',
        entityType: 'batch',
        entityId: batchId,
        uploadedBy: user.id
      },
      trx
    );
    await trx('batches')
      .where({ id: batchId })
      .update({
        state: 'complete',
        completed_at: completedAt,
        completed_by: user.id,
        record_file_id: recordFileId,
        version: row.version + 1,
        updated_at: completedAt
      });
    await record(
      {
        actorId: user.id,
        actorEmail: user.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'complete',
        before: { state: 'weighing' },
        after: {
          state: 'complete',
          recordFileId,
          lateSlurry: detail.batch.slurryExpiresAt !== null && completedAt > detail.batch.slurryExpiresAt
        }
      },
      trx
    );
    return { recordFileId };
  });
}
