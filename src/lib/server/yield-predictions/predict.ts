/**
 * Predict a revision's production yield and keep the figures with it: the revision's own recipe (wt %, path
 * length, target, tolerance) on the loading model of its library materials, the variation model given (or the
 * defaults), N parts, a seed. When the revision holds a recipe per chip bin and no model is given, each bin is
 * simulated with its own recipe and its share of the N parts (pump uniform inside the bin), and the clouds are
 * pooled: that is what the line builds. A model given explicitly is run on the nominal recipe.
 */
import { db } from '../db/index';
import { notFound, unprocessable } from '../../errors/domain-error';
import { prepareBasis } from '../../blend/basis';
import { GRID_NM } from '../../blend/grid';
import { resolveTarget } from '../../aim/target';
import { parseRecipe, loadingOf } from '../../recipe';
import { predictYield, variationModelSchema, type VariationModel, type YieldFigures } from '../../blend/spread';
import { loadRevisionComponents } from '../formulations/components';
import { storeYieldPrediction } from './store';
import { poolBinForecasts } from './per-bin';

export interface RevisionYieldRequest {
  revisionId: number;
  model: VariationModel | null;
  parts: number;
  seed: number;
}

export interface RevisionYield {
  id: number;
  model: VariationModel;
  figures: YieldFigures;
  cloud: { x: number[]; y: number[] };
}

export async function predictRevisionYield(actor: { id: number; email: string }, req: RevisionYieldRequest): Promise<RevisionYield> {
  const row = await db()('formulation_revisions').where({ id: req.revisionId }).first();
  if (!row) throw notFound('revision not found');
  const content = parseRecipe(row.content_json);
  const wt = loadingOf(content);
  if (!wt || !content.loading) throw unprocessable('the revision has no wt % on the loading model; a yield prediction needs them');
  const { components } = await loadRevisionComponents(db(), content);
  const basis = prepareBasis(components).loading;
  if (!basis) throw unprocessable('every phosphor needs an absorption coefficient in the library for a yield prediction');
  let peak = 0;
  for (let l = 1; l < basis.pump.length; l++) if (basis.pump[l] > basis.pump[peak]) peak = l;
  const bins = (content.binRecipes ?? []).map((b) => ({
    code: b.bin.code,
    fromNm: b.bin.fromNm,
    toNm: b.bin.toNm,
    sharePct: b.bin.sharePct
  }));
  const model = req.model ?? variationModelSchema.parse(bins.length ? { pump: { kind: 'bins', bins } } : {});
  const target = resolveTarget(content.target);
  if (bins.length && !req.model) {
    const pooled = poolBinForecasts(content, bins, {
      basis,
      pathLengthMm: content.loading.pathLengthMm,
      pumpPeakNm: GRID_NM[peak],
      centre: { x: target.x, y: target.y, cct: target.cct },
      quadrangle: target.ansiBin,
      tolerance: content.tolerance,
      parts: req.parts,
      seed: req.seed
    });
    const id = await storeYieldPrediction(actor, {
      revisionId: req.revisionId,
      model,
      seed: req.seed,
      parts: req.parts,
      figures: pooled.stored,
      source: 'predicted'
    });
    return { id, model, figures: pooled.figures, cloud: pooled.cloud };
  }
  const p = predictYield({
    basis,
    concentrationsWtPct: wt,
    pathLengthMm: content.loading.pathLengthMm,
    pumpPeakNm: GRID_NM[peak],
    centre: { x: target.x, y: target.y, cct: target.cct },
    quadrangle: target.ansiBin,
    tolerance: content.tolerance,
    model,
    parts: req.parts,
    seed: req.seed
  });
  const figures = { ...p.figures, rendering: p.rendering, breakdown: p.breakdown };
  const id = await storeYieldPrediction(actor, {
    revisionId: req.revisionId,
    model,
    seed: req.seed,
    parts: req.parts,
    figures,
    source: 'predicted'
  });
  const r5 = (v: number) => Math.round(v * 1e5) / 1e5;
  return { id, model, figures: p.figures, cloud: { x: Array.from(p.cloud.x, r5), y: Array.from(p.cloud.y, r5) } };
}
