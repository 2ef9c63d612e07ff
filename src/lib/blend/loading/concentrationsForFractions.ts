/**
 * Inverse of the loading model: phosphor concentrations (wt %) that give wanted optical
 * fractions, for a fixed effective path length L.
 *
 * n phosphors → n unknowns cᵢ, n equations wᵢ(c) = wᵢ* (the pump leak w₀ = 1 − Σwᵢ
 * follows). Solved by Levenberg–Marquardt (Levenberg 1944; Marquardt 1963) in
 * uᵢ = ln cᵢ, which keeps cᵢ > 0. Start: the optically thin limit, where
 * wᵢ/w₀ ≈ αᵢcᵢL·IQEᵢ·(λ̄_pump/λ̄ᵢ) (Beer–Lambert expanded to first order).
 * Reports the residual so a caller sees when a wanted mix is not reachable (e.g. the
 * cascade caps a phosphor's share).
 */
import { BlendInputError } from '../errors';
import { centroidNm } from '../grid';
import { levenbergMarquardt } from '../calibration/levenbergMarquardt';
import { beerLambertPhotonBudget, type LoadingBasis, type LoadingResult } from './beerLambertPhotonBudget';

/** ln of the largest concentration tried (100 wt %). */
const MAX_LN_C = Math.log(100);

export interface LoadingOptions {
  pathLengthMm: number;
  cascade?: boolean;
  cascadePathFactor?: number;
  /** Warm start (wt %), e.g. the solution for a nearby mix; default: thin-layer estimate. */
  initialWtPct?: number[];
}

export interface ConcentrationSolution {
  concentrationsWtPct: number[];
  result: LoadingResult;
  /** Max |wᵢ(c) − wᵢ*| over phosphors. */
  maxFractionError: number;
  converged: boolean;
}

export function concentrationsForFractions(
  basis: LoadingBasis,
  wantedFractions: number[],
  opts: LoadingOptions
): ConcentrationSolution {
  const n = basis.emission.length;
  if (wantedFractions.length !== n + 1) throw new BlendInputError('fractions: pump + one per phosphor expected');
  const w0 = Math.max(wantedFractions[0], 1e-6);
  const pumpCentroid = centroidNm(basis.pump);
  const run = (c: number[]): LoadingResult =>
    beerLambertPhotonBudget(basis, c, opts.pathLengthMm, opts.cascade ?? false, opts.cascadePathFactor ?? 1);
  const thin = basis.emission.map((e, i) => {
    const stokes = pumpCentroid / centroidNm(e);
    const gain = basis.absorptionPerWtPctMm[i] * opts.pathLengthMm * basis.iqe[i] * stokes;
    const c = wantedFractions[i + 1] / w0 / Math.max(gain, 1e-9);
    return Math.log(Math.min(Math.max(c, 1e-4), 80));
  });
  const start = opts.initialWtPct ? opts.initialWtPct.map((c, i) => (c > 0 ? Math.log(c) : thin[i])) : thin;
  const active = wantedFractions.slice(1).map((w) => w > 1e-9);
  const toC = (u: number[]): number[] => u.map((v, i) => (active[i] ? Math.exp(Math.min(v, MAX_LN_C)) : 0));
  const residualFor = (cascade: boolean) => (u: number[]): number[] => {
    const f = beerLambertPhotonBudget(basis, toC(u), opts.pathLengthMm, cascade, opts.cascadePathFactor ?? 1);
    return f.opticalFractions.slice(1).map((fi, i) => fi - wantedFractions[i + 1]);
  };
  // Without the cascade first (smooth, near the thin-layer start), then with it.
  let lm = levenbergMarquardt(residualFor(false), start, { maxIterations: 60, tolerance: 1e-14, initialDamping: 0.1, maxStep: 1, residualTolerance: 1e-10 });
  if (opts.cascade) {
    lm = levenbergMarquardt(residualFor(true), lm.params, { maxIterations: 60, tolerance: 1e-14, initialDamping: 0.1, maxStep: 1, residualTolerance: 1e-10 });
  }
  const c = toC(lm.params);
  const result = run(c);
  const maxFractionError = Math.max(...result.opticalFractions.slice(1).map((f, i) => Math.abs(f - wantedFractions[i + 1])));
  return { concentrationsWtPct: c, result, maxFractionError, converged: maxFractionError < 1e-6 };
}
