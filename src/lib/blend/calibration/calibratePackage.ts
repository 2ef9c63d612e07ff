/**
 * Calibration of a package model from measured builds: each phosphor's absorption αᵢ, the
 * pump escape e and optionally the IQE scale s of `packageLoadingModel.ts`, by
 * Levenberg–Marquardt (Levenberg 1944; Marquardt 1963) on the residuals of
 * `packageBuilds.ts` (colour in MacAdam steps, spectral shape, output).
 *
 * Identifiability (why some fits are refused): colour alone sees only the ratio of leaked
 * blue to converted light, so e and s trade off exactly unless some build has a measured
 * output (W or lm per pump W); e against α needs builds at two or more optical loadings
 * (Σcᵢ·L differs), because e is a constant factor while the leak falls as exp(−ΣαᵢcᵢL).
 * Parameters θ = ln α, ln e, ln s keep them positive; standard errors by the delta method
 * from s²(JᵀJ)⁻¹, so they grow with the misfit. The stopping reason is passed on as is.
 */
import { BlendInputError } from '../errors';
import { levenbergMarquardt, type LmStopReason } from './levenbergMarquardt';
import type { LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { packageObservables, packageSpd, type PackageOptics, type PackageParameters } from './packageLoadingModel';
import { comparatorFor, hasOutput, pathForBuild, type PackageBuild, type PackageGeometry } from './packageBuilds';

export interface PackageFitOptions extends PackageOptics, PackageGeometry {
  fitEscape?: boolean;
  fitIqeScale?: boolean;
  /** Start values (default: the basis' α, e = 1, s = 1). */
  start?: PackageParameters;
  /** Skip the scan for a common α factor (used by warm-started refits). */
  warmStart?: boolean;
}

export interface BuildResidual {
  label: string;
  measuredXy: [number, number];
  fittedXy: [number, number];
  /** Distance in MacAdam steps (IEC 60081 ellipse at the build's CCT). */
  steps: number;
  /** Model / measured − 1, when an output was measured. */
  outputError: number | null;
}

export interface PackageFit {
  parameters: PackageParameters;
  /** Delta-method standard errors (NaN when not estimable); 0 for a fixed parameter. */
  standardErrors: PackageParameters;
  builds: BuildResidual[];
  converged: boolean;
  reason: LmStopReason;
  iterations: number;
  fitted: { escape: boolean; iqeScale: boolean };
}

const MAX_LN = Math.log(1000);
const distinct = (xs: number[]) => new Set(xs.map((x) => x.toPrecision(6))).size;

export function checkIdentifiable(builds: PackageBuild[], opts: PackageFitOptions, phosphors: number): void {
  if (builds.length < 2) throw new BlendInputError('calibration needs at least two measured builds');
  for (const b of builds) {
    if (b.concentrationsWtPct.length !== phosphors) throw new BlendInputError(`${b.label}: give one wt % per phosphor (${phosphors})`);
  }
  const loadings = builds.map((b) => b.concentrationsWtPct.reduce((a, c) => a + c, 0) * pathForBuild(b, opts));
  if ((opts.fitEscape ?? true) && distinct(loadings) < 2) {
    throw new BlendInputError('fitting the pump escape needs builds at two or more loadings (total wt % × path)');
  }
  if (opts.fitIqeScale && !builds.some(hasOutput)) {
    throw new BlendInputError('fitting the IQE scale needs a measured output (W or lm per pump W) on at least one build');
  }
}

export function calibratePackage(basis: LoadingBasis, builds: PackageBuild[], opts: PackageFitOptions): PackageFit {
  const n = basis.emission.length;
  checkIdentifiable(builds, opts, n);
  const fitEscape = opts.fitEscape ?? true;
  const fitIqe = opts.fitIqeScale ?? false;
  const start = opts.start ?? { absorptionPerWtPctMm: basis.absorptionPerWtPctMm, pumpEscape: 1, iqeScale: 1 };
  const paths = builds.map((b) => pathForBuild(b, opts));
  const comparators = builds.map(comparatorFor);
  const toParams = (t: number[]): PackageParameters => ({
    absorptionPerWtPctMm: t.slice(0, n).map((v) => Math.exp(Math.min(v, MAX_LN))),
    pumpEscape: fitEscape ? Math.exp(Math.min(t[n], MAX_LN)) : start.pumpEscape,
    iqeScale: fitIqe ? Math.exp(Math.min(t[n + (fitEscape ? 1 : 0)], MAX_LN)) : start.iqeScale
  });
  const outputs = (p: PackageParameters) =>
    builds.map((b, k) => packageObservables(packageSpd(basis, p, b.concentrationsWtPct, paths[k], opts)));
  const residuals = (t: number[]) => {
    const p = toParams(t);
    return outputs(p).flatMap((o, k) => comparators[k].residuals(o));
  };
  let theta = start.absorptionPerWtPctMm.map((a) => Math.log(a > 0 ? a : 0.1));
  if (fitEscape) theta.push(Math.log(start.pumpEscape));
  if (fitIqe) theta.push(Math.log(start.iqeScale));
  const count = residuals(theta).length;
  if (count <= theta.length)
    throw new BlendInputError(`calibration has ${theta.length} parameters but only ${count} measured values; add builds`);
  if (!opts.warmStart) theta = scanCommonFactor(theta, n, residuals);
  const lm = levenbergMarquardt(residuals, theta, {
    maxIterations: 100,
    tolerance: 1e-10,
    maxStep: 1,
    gradientTolerance: 1e-7,
    stepTolerance: 1e-9
  });
  const parameters = toParams(lm.params);
  const se = lm.standardErrors;
  const final = outputs(parameters);
  return {
    parameters,
    standardErrors: {
      absorptionPerWtPctMm: parameters.absorptionPerWtPctMm.map((a, i) => a * se[i]),
      pumpEscape: fitEscape ? parameters.pumpEscape * se[n] : 0,
      iqeScale: fitIqe ? parameters.iqeScale * se[n + (fitEscape ? 1 : 0)] : 0
    },
    builds: builds.map((b, k) => {
      const out =
        b.outputWPerPumpW !== undefined
          ? final[k].wPerPumpW / b.outputWPerPumpW - 1
          : b.outputLmPerPumpW !== undefined
            ? final[k].lmPerPumpW / b.outputLmPerPumpW - 1
            : null;
      return { label: b.label, measuredXy: b.measuredXy, fittedXy: final[k].xy, steps: comparators[k].steps(final[k]), outputError: out };
    }),
    converged: lm.converged,
    reason: lm.reason,
    iterations: lm.iterations,
    fitted: { escape: fitEscape, iqeScale: fitIqe }
  };
}

/** Robust start: a common factor 0.01–100× on every α, the best kept (the saturated regime is flat). */
function scanCommonFactor(theta: number[], n: number, residuals: (t: number[]) => number[]): number[] {
  const cost = (t: number[]) => residuals(t).reduce((a, v) => a + v * v, 0);
  let best = theta;
  let bestCost = cost(theta);
  for (let k = -8; k <= 8; k++) {
    const t = theta.map((v, i) => (i < n ? v + (k / 4) * Math.LN10 : v));
    const c = cost(t);
    if (c < bestCost) {
      best = t;
      bestCost = c;
    }
  }
  return best;
}
