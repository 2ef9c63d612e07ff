/**
 * Where the colour spread comes from: the variance breakdown. Each source is run alone (all others set to
 * no variation) with the same seed and N; its spread is the trace of the u′v′ covariance of that cloud
 * (CIE 15:2004 §8.1 u′v′). Shares are these traces normalised to sum to 1 — one-source-at-a-time, so
 * interactions are not attributed; `sumOverTotal` (Σ traces / trace of the full run) shows how far from
 * additive the sources are (1 = additive, as first-order propagation predicts).
 */
import { xyToUvPrime } from '../../spectral/colorimetry/chromaticity';
import { onlySource, SPREAD_SOURCES, type SpreadSource, type VariationModel } from './model';
import { simulateSpread, type SpreadRecipe } from './simulate';
import type { PartModel } from './partColour';

export interface SpreadBreakdown {
  sources: { source: SpreadSource; trace: number; share: number }[];
  totalTrace: number;
  sumOverTotal: number;
}

/** 2×2 covariance of u′v′ (N − 1) of an x,y cloud: [var u′, cov, var v′]. */
export function uvPrimeCovariance(x: ArrayLike<number>, y: ArrayLike<number>): [number, number, number] {
  const n = x.length;
  const u = new Float64Array(n);
  const v = new Float64Array(n);
  let mu = 0;
  let mv = 0;
  for (let i = 0; i < n; i++) {
    [u[i], v[i]] = xyToUvPrime(x[i], y[i]);
    mu += u[i];
    mv += v[i];
  }
  mu /= n;
  mv /= n;
  let suu = 0;
  let suv = 0;
  let svv = 0;
  for (let i = 0; i < n; i++) {
    suu += (u[i] - mu) ** 2;
    suv += (u[i] - mu) * (v[i] - mv);
    svv += (v[i] - mv) ** 2;
  }
  const d = Math.max(1, n - 1);
  return [suu / d, suv / d, svv / d];
}

export function spreadBreakdown(
  part: PartModel,
  recipe: SpreadRecipe,
  model: VariationModel,
  parts: number,
  seed: number
): SpreadBreakdown {
  const full = simulateSpread(part, recipe, model, parts, seed);
  const [a, , c] = uvPrimeCovariance(full.x, full.y);
  const totalTrace = a + c;
  const traces = SPREAD_SOURCES.map((source) => {
    const cloud = simulateSpread(part, recipe, onlySource(model, source), parts, seed);
    const [su, , sv] = uvPrimeCovariance(cloud.x, cloud.y);
    return { source, trace: su + sv };
  });
  const sum = traces.reduce((s, t) => s + t.trace, 0);
  return {
    sources: traces.map((t) => ({ ...t, share: sum > 0 ? t.trace / sum : 0 })),
    totalTrace,
    sumOverTotal: totalTrace > 0 ? sum / totalTrace : 0
  };
}
