/** Scaling a planned batch up or down: the stored weigh-out input at a new size, recomputed exactly. */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import type { User } from '../accounts/users';
import { computeWeighout } from '../../batches/weighout/compute';
import { scaleByFactor, scaleToMass } from '../../batches/weighout/scale';
import type { WeighoutInput } from '../../batches/weighout/schema';
import { impossible, invalid } from './errors';
import { ExactNumberError } from '../../batches/weighout/rational';
import { expectState, expectVersion, lockBatch } from './lock';
import { lineRowsFor, planColumns } from './lines';
import { decimalText, placesOf } from './records';

export type ScaleInput = { version: number; batchMassG: number } | { version: number; factor: number };

export async function scaleBatch(user: User, batchId: number, input: ScaleInput): Promise<{ batchMassG: string }> {
  return writeTransaction(async (trx) => {
    const row = await lockBatch(trx, batchId);
    expectVersion(row, input.version, `Batch ${row.batch_number}`);
    expectState(row, ['planned'], 'be rescaled once weighing has started');
    const old: WeighoutInput = JSON.parse(row.input_json);
    const current = decimalText(row.batch_mass_g, placesOf(row.resolution_g));
    let next: WeighoutInput;
    let result: ReturnType<typeof computeWeighout>;
    try {
      next = 'factor' in input ? scaleByFactor(old, current, input.factor) : scaleToMass(old, input.batchMassG);
      result = computeWeighout(next);
    } catch (err) {
      if (err instanceof ExactNumberError) throw invalid(`A number cannot be weighed exactly: ${err.message}.`);
      throw err;
    }
    if (!result.ok) throw impossible(result.errors);
    await trx('batch_lines').where({ batch_id: batchId }).delete();
    await trx('batch_lines').insert(lineRowsFor(batchId, result.plan.lines));
    await trx('batches')
      .where({ id: batchId })
      .update({
        ...planColumns(result.plan),
        sizing_kind: 'mass',
        part_count: null,
        dispense_mass_g: null,
        yield_loss_pct: null,
        input_json: JSON.stringify(next),
        version: row.version + 1,
        updated_at: new Date()
      });
    await record(
      {
        actorId: user.id,
        actorEmail: user.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'scale',
        before: { batchMassG: current },
        after: { batchMassG: result.plan.batchMassG }
      },
      trx
    );
    return { batchMassG: result.plan.batchMassG };
  });
}
