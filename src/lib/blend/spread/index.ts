/** Production spread: variation model, seeded Monte Carlo through the loading model, yield figures, variance breakdown. */
export { variationModelSchema, pumpSpreadSchema, DEFAULT_VARIATION_MODEL, NO_VARIATION, SPREAD_SOURCES, onlySource } from './model';
export type { VariationModel, VariationModelInput, PumpSpread, SpreadSource } from './model';
export { seededRandom, type Random } from './prng';
export { buildPartModel, partXyz, PEAK_RANGE_NM, type PartModel } from './partColour';
export { simulateSpread, DEFAULT_PARTS, MAX_PARTS, type SpreadRecipe, type SpreadCloud, type PartDraw } from './simulate';
export { yieldFigures, distributionOf, stepsFrom, shareWithinSteps, STEP_RINGS, type YieldFigures, type Distribution } from './figures';
export { spreadBreakdown, uvPrimeCovariance, type SpreadBreakdown } from './breakdown';
export { predictYield, type YieldPredictionInput, type YieldPrediction } from './predict';
export { wilsonInterval, Z95, type BinomialInterval } from './wilson';
export { fitSlurryMassCv, type SpreadFit } from './fitSpread';
export { renderingOfDraws, DEFAULT_RENDERING_SUBSAMPLE, type RenderingFigures } from './renderingSubsample';
export { cloudSample, samplePointsOf, CLOUD_SAMPLE_MAX, type CloudSample } from './cloud-sample';
export { pumpPeakNm } from './pump-peak';
