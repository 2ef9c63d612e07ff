/**
 * "Fit the spread to this batch": the slurry-mass CV of the revision's variation model is scaled so the
 * forecast's u′v′ spread equals the measured batch's (`fitSlurryMassCv`, delta method), on the recipe the
 * batch was weighed from (its chip bin's recipe, pump uniform inside that bin, when the revision holds a
 * matrix). Saved as the revision's variation model for the next forecast, with the batch named.
 */
import { db } from '../db/index';
import { unprocessable, notFound } from '../../errors/domain-error';
import { opticalDepthsOf } from '../../blend/loading/beerLambertPhotonBudget';
import { buildPartModel, fitSlurryMassCv, type VariationModel } from '../../blend/spread';
import { binRecipeOf, loadingOf } from '../../recipe';
import { revisionSpreadSetup } from '../yield-predictions/setup';
import { getRevisionVariationModel, putRevisionVariationModel } from '../yield-predictions/variation-model';
import { computeResults, loadContext } from './results';

/** Fewer parts give a variance too loose to act on (σ of a variance ≈ √(2/n): 32 % at 20 parts; common practice). */
export const MIN_PARTS_FOR_FIT = 20;
/** Simulated parts per trial run of the fit (two runs). */
const FIT_PARTS = 4000;
const FIT_SEED = 1;

export interface BatchSpreadFit {
  batchNumber: string;
  parts: number;
  before: VariationModel;
  after: VariationModel;
  /** False when the other sources alone spread more than the batch (slurry-mass CV set to 0). */
  explained: boolean;
  version: number;
}

export async function fitSpreadToBatch(actor: { id: number; email: string }, batchId: number, version: number): Promise<BatchSpreadFit> {
  const ctx = await loadContext(batchId);
  if (!ctx) throw notFound('batch not found');
  const { judged } = await computeResults(ctx);
  const batchNumber = ctx.detail.batch.batchNumber;
  const measured = judged.parts.map((p) => p.metrics).filter((m) => Number.isFinite(m.x) && Number.isFinite(m.y));
  if (measured.length < MIN_PARTS_FOR_FIT)
    throw unprocessable(
      `Batch ${batchNumber} has ${measured.length} measured part(s); fitting the spread needs at least ${MIN_PARTS_FOR_FIT}. ` +
        'Nothing was changed.'
    );
  const content = ctx.revision.content;
  const { wt: nominal, shared } = await revisionSpreadSetup(db(), content);
  const current = await getRevisionVariationModel(ctx.revision.id);
  const code = ctx.detail.batch.chipBinCode;
  const bin = code ? binRecipeOf(content, code) : null;
  const wt = bin ? loadingOf(content, code!) : nominal;
  if (!wt) throw unprocessable(`chip bin ${code} has no wt % on the loading model`);
  const trial: VariationModel = bin
    ? {
        ...current.model,
        pump: { kind: 'bins', bins: [{ code: bin.bin.code, fromNm: bin.bin.fromNm, toNm: bin.bin.toNm, sharePct: 100 }] }
      }
    : current.model;
  const part = buildPartModel(shared.basis);
  const recipe = { opticalDepths: opticalDepthsOf(shared.basis, wt, shared.pathLengthMm), pumpPeakNm: shared.pumpPeakNm };
  const points = { x: measured.map((m) => m.x), y: measured.map((m) => m.y) };
  const fit = fitSlurryMassCv(part, recipe, trial, points, FIT_PARTS, FIT_SEED);
  const after: VariationModel = { ...current.model, slurryMassCvPct: fit.model.slurryMassCvPct };
  const newVersion = await putRevisionVariationModel(actor, ctx.revision.id, {
    model: after,
    version,
    fit: {
      batchId,
      batchNumber,
      detail: {
        parts: measured.length,
        explained: fit.explained,
        measuredTrace: fit.measuredTrace,
        otherSourcesTrace: fit.otherSourcesTrace
      }
    }
  });
  return { batchNumber, parts: measured.length, before: current.model, after, explained: fit.explained, version: newVersion };
}
