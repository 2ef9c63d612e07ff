/** Plans a batch from an approved revision: validate → compute the weigh-out → save batch and lines (one transaction). */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { getRevision } from '../formulations/read';
import type { User } from '../accounts/users';
import { computeWeighout, type WeighoutPlan } from '../../batches/weighout/compute';
import { ExactNumberError } from '../../batches/weighout/rational';
import { planInputFromRevision } from '../../batches/plan-weighout';
import type { ChosenChipBin } from '../../batches/chip-lot';
import { describeTarget } from '../../batches/weighout/target';
import type { WeighoutInput } from '../../batches/weighout/schema';
import type { CreateBatchRequest } from '../../batches/schema';
import { conflict, impossible, invalid, notFound } from './errors';
import { ensureBatchCounter, nextBatchNumber } from './number';
import { lineRowsFor, planColumns } from './lines';

export interface PreparedBatch {
  input: WeighoutInput;
  plan: WeighoutPlan;
  chip: ChosenChipBin;
}

/** The plan a request would give, without saving (also used by the preview endpoint). */
export async function prepareBatch(
  req: CreateBatchRequest
): Promise<PreparedBatch & { revision: NonNullable<Awaited<ReturnType<typeof getRevision>>> }> {
  const revision = await getRevision(req.revisionId);
  if (!revision) throw notFound(`Formulation revision ${req.revisionId}`);
  if (revision.state !== 'approved') {
    throw conflict(
      `${revision.formulationCode} revision ${revision.revisionNo} is ${revision.state}: batches are made from the approved revision only.`
    );
  }
  const sysId = revision.content.silicone.siliconeSystemId;
  if (req.siliconeSystemId != null && req.siliconeSystemId !== sysId) {
    throw invalid(
      `The approved revision specifies the silicone system "${revision.content.silicone.name}"; a different silicone needs a new revision.`,
      [{ path: 'siliconeSystemId', message: "must be the revision's silicone system" }]
    );
  }
  const built = planInputFromRevision(revision.content, req);
  if (!built.ok) throw invalid(built.errors.map((e) => e.message).join('; '), built.errors);
  let result: ReturnType<typeof computeWeighout>;
  try {
    result = computeWeighout(built.input);
  } catch (err) {
    if (err instanceof ExactNumberError) throw invalid(`A number cannot be weighed exactly: ${err.message}.`);
    throw err;
  }
  if (!result.ok) throw impossible(result.errors);
  return { input: built.input, plan: result.plan, chip: built.chip, revision };
}

export async function createBatch(user: User, req: CreateBatchRequest): Promise<{ id: number; batchNumber: string }> {
  const { input, plan, chip, revision } = await prepareBatch(req);
  const target = describeTarget(revision.content.target, revision.content.tolerance);
  const s = revision.content.silicone;
  await ensureBatchCounter();
  for (let attempt = 0; ; attempt++) {
    try {
      return await writeTransaction(async (trx) => {
        const batchNumber = await nextBatchNumber(trx);
        const [id] = await trx('batches').insert({
          batch_number: batchNumber,
          revision_id: revision.id,
          formulation_code: revision.formulationCode,
          formulation_name: revision.formulationName,
          revision_no: revision.revisionNo,
          state: 'planned',
          sizing_kind: req.sizing.kind,
          part_count: req.sizing.kind === 'parts' ? req.sizing.partCount : null,
          dispense_mass_g: req.sizing.kind === 'parts' ? req.sizing.dispenseMassG : null,
          yield_loss_pct: req.sizing.kind === 'parts' ? req.sizing.yieldLossPct : null,
          loading_basis: req.loading.basis,
          total_loading_pct: req.loading.mode === 'total' ? req.loading.totalPct : null,
          ...planColumns(plan),
          silicone_system_id: s.siliconeSystemId,
          silicone_name: s.name,
          ratio_a: s.ratioA,
          ratio_b: s.ratioB,
          pot_life_min: s.potLifeMin,
          plant_limit_min: req.plantLimitMin ?? null,
          resolution_g: plan.resolutionG,
          min_weight_g: plan.minWeightG,
          balance_ref: req.balance.ref || null,
          chip_lot: chip.lotNumber,
          chip_bin_code: chip.binCode,
          chip_wavelength_nm: chip.wavelengthNm,
          input_json: JSON.stringify(input),
          target_json: JSON.stringify(target),
          notes: req.notes || null,
          created_by: user.id
        });
        await trx('batch_lines').insert(lineRowsFor(id, plan.lines));
        await record(
          {
            actorId: user.id,
            actorEmail: user.email,
            entityType: 'batch',
            entityId: id,
            action: 'create',
            after: {
              batchNumber,
              revisionId: revision.id,
              chipBin: chip.binCode,
              request: req,
              lines: plan.lines.map((l) => [l.code, l.targetG])
            }
          },
          trx
        );
        return { id, batchNumber };
      });
    } catch (err) {
      // A number already taken (a batch numbered outside the counter): move the counter past it and try again.
      if ((err as { code?: string }).code === 'ER_DUP_ENTRY' && attempt < 3) {
        await ensureBatchCounter(new Date(), { resync: true });
        continue;
      }
      throw err;
    }
  }
}
