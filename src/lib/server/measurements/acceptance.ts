/** Quality's colour acceptance for a batch (optimistic lock on `version`; 0 = none saved yet). */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import type { AcceptanceInput } from '../../measurements/schema';
import { lockBatch } from '../batches/lock';
import { conflict } from './errors';
import { requireQuality, type Caller } from './caller';
import * as records from './records';

export async function setAcceptance(caller: Caller, batchId: number, input: AcceptanceInput): Promise<{ version: number }> {
  requireQuality(caller, 'Choosing the acceptance');
  return writeTransaction(async (trx) => {
    const batch = await lockBatch(trx, batchId);
    if (batch.state === 'released' || batch.state === 'rejected')
      throw conflict(`Batch ${batch.batch_number} is ${batch.state}: its acceptance is part of the signed record.`);
    const current = await records.getAcceptance(batchId, trx);
    const currentVersion = current?.version ?? 0;
    if (input.version !== currentVersion) {
      throw conflict(
        `The acceptance of batch ${batch.batch_number} was changed by someone else since ` +
          `you loaded it (version ${input.version}, now ${currentVersion}). Reload and ` +
          `check before trying again.`
      );
    }
    const row = {
      mode: input.mode,
      steps: input.mode === 'steps' ? (input.steps ?? null) : null,
      require_target_bin: input.requireTargetBin,
      updated_by: caller.id,
      updated_at: new Date()
    };
    if (current)
      await trx('batch_acceptance')
        .where({ batch_id: batchId, version: currentVersion })
        .update({ ...row, version: currentVersion + 1 });
    else await trx('batch_acceptance').insert({ batch_id: batchId, ...row, version: 1 });
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'acceptance-set',
        before: current,
        after: { mode: row.mode, steps: row.steps, requireTargetBin: row.require_target_bin, version: currentVersion + 1 }
      },
      trx
    );
    return { version: currentVersion + 1 };
  });
}
