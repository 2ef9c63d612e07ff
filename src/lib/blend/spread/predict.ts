/** One yield prediction: build the part model, simulate N parts, summarise, and break the spread down by source. */
import type { ColourCentre, Tolerance } from '../../aim/distance';
import type { AnsiQuadrangle } from '../../spectral/ansi/c78377';
import { opticalDepthsOf, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { spreadBreakdown, type SpreadBreakdown } from './breakdown';
import { yieldFigures, type YieldFigures } from './figures';
import type { VariationModel } from './model';
import { buildPartModel } from './partColour';
import { simulateSpread, type SpreadCloud } from './simulate';
import { DEFAULT_RENDERING_SUBSAMPLE, renderingOfDraws, type RenderingFigures } from './renderingSubsample';

export interface YieldPredictionInput {
  basis: LoadingBasis;
  concentrationsWtPct: number[];
  pathLengthMm: number;
  pumpPeakNm: number;
  centre: ColourCentre;
  quadrangle: AnsiQuadrangle | null;
  tolerance: Tolerance | null;
  model: VariationModel;
  parts: number;
  seed: number;
  /** Parts whose Ra and R9 are computed from full spectra (default 200; 0 = none). */
  renderingSubsample?: number;
  /** Also run the one-source-at-a-time breakdown (7 runs in all). */
  breakdown?: boolean;
}

export interface YieldPrediction {
  cloud: SpreadCloud;
  figures: YieldFigures;
  breakdown: SpreadBreakdown | null;
  rendering: RenderingFigures | null;
}

export function predictYield(input: YieldPredictionInput): YieldPrediction {
  const part = buildPartModel(input.basis);
  const recipe = {
    opticalDepths: opticalDepthsOf(input.basis, input.concentrationsWtPct, input.pathLengthMm),
    pumpPeakNm: input.pumpPeakNm
  };
  const keep = Math.min(input.parts, input.renderingSubsample ?? DEFAULT_RENDERING_SUBSAMPLE);
  const cloud = simulateSpread(part, recipe, input.model, input.parts, input.seed, keep);
  return {
    cloud,
    figures: yieldFigures(cloud, input.centre, input.quadrangle, input.tolerance),
    rendering: keep > 0 ? renderingOfDraws(input.basis, cloud.draws) : null,
    breakdown: input.breakdown === false ? null : spreadBreakdown(part, recipe, input.model, input.parts, input.seed)
  };
}
