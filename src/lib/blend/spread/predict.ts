/** One yield prediction: build the part model, simulate N parts, summarise, and break the spread down by source. */
import type { ColourCentre, Tolerance } from '../../aim/distance';
import type { AnsiQuadrangle } from '../../spectral/ansi/c78377';
import { opticalDepthsOf, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { spreadBreakdown, type SpreadBreakdown } from './breakdown';
import { yieldFigures, type YieldFigures } from './figures';
import type { VariationModel } from './model';
import { buildPartModel } from './partColour';
import { simulateSpread, type SpreadCloud } from './simulate';

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
  /** Also run the one-source-at-a-time breakdown (7 runs in all). */
  breakdown?: boolean;
}

export interface YieldPrediction {
  cloud: SpreadCloud;
  figures: YieldFigures;
  breakdown: SpreadBreakdown | null;
}

export function predictYield(input: YieldPredictionInput): YieldPrediction {
  const part = buildPartModel(input.basis);
  const recipe = {
    opticalDepths: opticalDepthsOf(input.basis, input.concentrationsWtPct, input.pathLengthMm),
    pumpPeakNm: input.pumpPeakNm
  };
  const cloud = simulateSpread(part, recipe, input.model, input.parts, input.seed);
  return {
    cloud,
    figures: yieldFigures(cloud, input.centre, input.quadrangle, input.tolerance),
    breakdown: input.breakdown === false ? null : spreadBreakdown(part, recipe, input.model, input.parts, input.seed)
  };
}
