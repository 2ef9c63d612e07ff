/**
 * Predict a revision's production yield and keep the figures with it: the revision's own recipe (wt %, path
 * length, target, tolerance) on the loading model of its library materials, the variation model given (or the
 * revision's own, `variation-model.ts`), N parts, a seed. When the revision holds a recipe per chip bin and no
 * model is given, each bin is simulated with its own recipe and its share of the N parts (pump uniform inside
 * the bin, the other sources from the revision's model), and the clouds are pooled: that is what the line
 * builds. A model given explicitly is run on the nominal recipe.
 */
import { db } from '../db/index';
import { notFound } from '../../errors/domain-error';
import { parseRecipe } from '../../recipe';
import { cloudSample, predictYield, type VariationModel, type YieldFigures } from '../../blend/spread';
import { storeYieldPrediction } from './store';
import { poolBinForecasts } from './per-bin';
import { revisionSpreadSetup } from './setup';
import { getRevisionVariationModel } from './variation-model';

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

const r5 = (v: number) => Math.round(v * 1e5) / 1e5;

export async function predictRevisionYield(actor: { id: number; email: string }, req: RevisionYieldRequest): Promise<RevisionYield> {
  const row = await db()('formulation_revisions').where({ id: req.revisionId }).first();
  if (!row) throw notFound('revision not found');
  const content = parseRecipe(row.content_json);
  const { wt, bins, shared } = await revisionSpreadSetup(db(), content);
  const model = req.model ?? (await getRevisionVariationModel(req.revisionId)).model;
  const store = (figures: unknown) =>
    storeYieldPrediction(actor, { revisionId: req.revisionId, model, seed: req.seed, parts: req.parts, figures, source: 'predicted' });
  if (bins.length && !req.model) {
    const pooled = poolBinForecasts(content, bins, { ...shared, base: model, parts: req.parts, seed: req.seed });
    const id = await store(pooled.stored);
    return { id, model, figures: pooled.figures, cloud: pooled.cloud };
  }
  const p = predictYield({ ...shared, concentrationsWtPct: wt, model, parts: req.parts, seed: req.seed });
  const id = await store({ ...p.figures, rendering: p.rendering, breakdown: p.breakdown, cloudSample: cloudSample(p.cloud.x, p.cloud.y) });
  return { id, model, figures: p.figures, cloud: { x: Array.from(p.cloud.x, r5), y: Array.from(p.cloud.y, r5) } };
}
