/**
 * Fit the variation model's spread to a measured batch: the slurry-mass CV is scaled so that the trace of the
 * simulated u′v′ covariance equals the measured one. To first order the trace is additive over independent
 * sources and quadratic in each source's σ (delta method, Casella & Berger, Statistical Inference, §5.5.4):
 *   tr(c) = t₀ + (t₁ − t₀)·c²/c₁²   (t₀ with the mass CV off, t₁ at a probe CV c₁),
 * so c = c₁ √((t_meas − t₀)/(t₁ − t₀)). When the other sources alone already exceed the measured spread,
 * the CV is set to 0 and `explained` is false. Same seed and N for both runs.
 */
import { uvPrimeCovariance } from './breakdown';
import type { VariationModel } from './model';
import type { PartModel } from './partColour';
import { simulateSpread, type SpreadRecipe } from './simulate';

export interface SpreadFit {
  model: VariationModel;
  measuredTrace: number;
  /** Trace with the other sources only. */
  otherSourcesTrace: number;
  /** The other sources alone do not exceed the measured spread. */
  explained: boolean;
}

const PROBE_CV_PCT = 2;

export function fitSlurryMassCv(
  part: PartModel,
  recipe: SpreadRecipe,
  model: VariationModel,
  measured: { x: ArrayLike<number>; y: ArrayLike<number> },
  parts: number,
  seed: number
): SpreadFit {
  const [mu, , mv] = uvPrimeCovariance(measured.x, measured.y);
  const measuredTrace = mu + mv;
  const trace = (cvPct: number): number => {
    const c = simulateSpread(part, recipe, { ...model, slurryMassCvPct: cvPct }, parts, seed);
    const [a, , b] = uvPrimeCovariance(c.x, c.y);
    return a + b;
  };
  const t0 = trace(0);
  const t1 = trace(PROBE_CV_PCT);
  const explained = measuredTrace >= t0 && t1 > t0;
  const cv = explained ? PROBE_CV_PCT * Math.sqrt((measuredTrace - t0) / (t1 - t0)) : 0;
  return { model: { ...model, slurryMassCvPct: Math.min(50, Number(cv.toFixed(3))) }, measuredTrace, otherSourcesTrace: t0, explained };
}
