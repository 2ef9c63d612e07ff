/**
 * Correction from a measured batch: the measured mean and the revision go to the blend solver's
 * correction method (src/lib/measurements/correction.ts → correctBatch); the corrected ratios become a
 * new draft revision linked to the batch (formulations' createCorrectionDraft), for the formulator
 * to review. The correction (mean used, step share, predicted new point) is kept with the batch.
 */
import { record } from '../db/audit';
import { send } from '../mail/index';
import * as users from '../accounts/users';
import { loadBlendComponents } from '../library/components';
import { createCorrectionDraft } from '../formulations/save';
import { correctionDraftMessage } from '../mail/templates/correction-draft';
import { BlendInputError } from '../../blend/errors';
import { CorrectionRefusedError, type TrimCap } from '../../blend/correctionLimits';
import { correctFromBatch } from '../../measurements/index';
import { correctFromBatchAtCondition } from '../../measurements/correction';
import { correctBinFromBatch } from '../../measurements/correction-bin';
import { describeCondition, isBenchCondition } from '../../aim/condition';
import { requireHotComponents } from '../../blend/thermal/hotComponents';
import { thermalByMaterialIds } from '../library/thermal';
import { hasRecipeMatrix, materialIdsOf } from '../../recipe';
import { unprocessable } from '../../errors/domain-error';
import { conflict, notFound } from './errors';
import { requireQuality, type Caller } from './caller';
import { computeResults, loadContext } from './results';

export interface CorrectionOutcome {
  correctionId: number;
  revisionId: number;
  revisionNo: number;
  predicted: { x: number; y: number; cct: number; duv: number };
  /** Steps (SDCM) from target of the predicted point. */
  predictedSteps: number;
  /** Share of the full correction applied and what capped it. */
  cap: TrimCap;
  /** The chip bin whose recipe was corrected (a batch of a recipe matrix); null = the nominal recipe. */
  binCode: string | null;
  measuredMean: { x: number; y: number };
}

export async function makeCorrectionDraft(
  caller: Caller,
  batchId: number,
  stepFraction: number,
  origin: string
): Promise<CorrectionOutcome> {
  requireQuality(caller, 'A correction draft');
  const ctx = await loadContext(batchId);
  if (!ctx) throw notFound(`Batch ${batchId}`);
  const { judged, view } = await computeResults(ctx);
  const mean = judged.summary.meanPoint;
  const b = ctx.detail.batch;
  if (!mean) throw conflict(`Batch ${b.batchNumber} has no measured parts: a correction needs the measured mean.`);
  const content = ctx.revision.content;
  const ids = materialIdsOf(content);
  const components = await loadBlendComponents(ids.pump, ids.phosphors);
  const offset = judged.summary.meanOffset!;
  const note =
    `Correction from batch ${b.batchNumber} (${judged.summary.parts} parts): ` +
    `measured mean x ${mean.x.toFixed(4)}, y ${mean.y.toFixed(4)}, ` +
    `${offset.steps.toFixed(1)} steps from target.`;
  let corrected;
  const binCode = b.chipBinCode && hasRecipeMatrix(content) ? b.chipBinCode : null;
  try {
    const condition = content.condition;
    const measuredAt: 'bench' | 'condition' = view.summaryCondition === describeCondition(null) ? 'bench' : 'condition';
    // Aimed hot: the correction aims the hot point, from whichever condition the summary's parts were measured at.
    const thermal = condition && !isBenchCondition(condition) ? await thermalByMaterialIds([ids.pump, ...ids.phosphors]) : null;
    if (binCode) {
      // A batch weighed for a chip bin: its bin's recipe, on the pump at the bin's centre, is what gets corrected.
      const hot = thermal && condition ? { of: (c: typeof components) => requireHotComponents(c, thermal, condition), measuredAt } : null;
      corrected = correctBinFromBatch(content, components, binCode, mean, note, stepFraction, hot);
    } else if (thermal && condition) {
      const hot = requireHotComponents(components, thermal, condition);
      corrected = correctFromBatchAtCondition(content, components, hot, mean, measuredAt, note, stepFraction);
    } else corrected = correctFromBatch(content, components, mean, note, stepFraction);
  } catch (err) {
    // Refused or uncomputable: nothing is saved and nobody is mailed.
    if (err instanceof CorrectionRefusedError) throw unprocessable(`No correction draft was made: ${err.message}`);
    if (err instanceof BlendInputError) throw unprocessable(`The correction cannot be computed: ${err.message}`);
    if (err instanceof RangeError) throw unprocessable(`No correction draft was made: ${err.message}`);
    throw err;
  }
  const r = corrected.response;
  // The draft, the batch's correction record and its audit event are written together or not at all.
  const draft = await createCorrectionDraft(caller, ctx.revision.id, corrected.content, batchId, async (trx, d) => {
    const [id] = await trx('batch_corrections').insert({
      batch_id: batchId,
      revision_id: d.revisionId,
      step_fraction: stepFraction,
      measured_x: mean.x,
      measured_y: mean.y,
      parts_count: judged.summary.parts,
      predicted_x: r.predicted.x,
      predicted_y: r.predicted.y,
      predicted_cct_k: r.predicted.cct,
      predicted_duv: r.predicted.duv,
      created_by: caller.id,
      detail_json: JSON.stringify({
        recipeKind: r.recipe.kind,
        multipliers: r.multipliers,
        bias: r.bias,
        errorBefore: r.errorBefore,
        errorAfter: r.errorAfter,
        converged: r.converged,
        cap: r.cap,
        binCode
      })
    });
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'correction-draft',
        after: {
          correctionId: id,
          revisionId: d.revisionId,
          revisionNo: d.revisionNo,
          stepFraction,
          binCode,
          measuredMean: mean,
          predicted: r.predicted
        }
      },
      trx
    );
    return id as number;
  });
  const correctionId = draft.alongside;
  const author = await users.get(ctx.revision.createdBy);
  if (author?.active) {
    await send(
      correctionDraftMessage({
        to: [author.email],
        batchNumber: b.batchNumber,
        formulation: `${b.formulationCode} ${b.formulationName}`,
        draftRevisionNo: draft.revisionNo,
        requestedBy: caller.name,
        offsetText: `${offset.steps.toFixed(1)} steps (Δx ${offset.dx.toFixed(4)}, Δy ${offset.dy.toFixed(4)})`,
        link: `${origin}/formulations/${ctx.revision.formulationId}/revisions/${draft.revisionId}`
      })
    );
  }
  return {
    correctionId,
    revisionId: draft.revisionId,
    revisionNo: draft.revisionNo,
    predicted: r.predicted,
    predictedSteps: r.errorAfter.steps,
    cap: r.cap,
    binCode,
    measuredMean: { x: mean.x, y: mean.y }
  };
}
