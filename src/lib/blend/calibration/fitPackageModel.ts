/**
 * A package model from builds: the fit (`calibratePackage`), its bootstrap over builds
 * (Efron 1979, `bootstrapBuilds`) and the uncertainty stated for each parameter — the larger
 * of the bootstrap standard deviation and the delta-method standard error (which is scaled
 * by the residual variance, so it grows with the misfit). With few builds the bootstrap alone
 * understates the spread (a resample of three builds has at most three distinct members),
 * hence the larger of the two [choice of this model, stated in its report].
 * `PackageModelRef` is how a formulation revision cites a stored, versioned package model.
 */
import type { LoadingBasis } from '../loading/beerLambertPhotonBudget';
import type { PackageBuild } from './packageBuilds';
import type { PackageParameters } from './packageLoadingModel';
import { calibratePackage, type PackageFit, type PackageFitOptions } from './calibratePackage';
import { bootstrapBuilds, type BootstrapReport } from './bootstrapBuilds';

export interface PackageModelRef {
  id: number;
  version: number;
}

export interface PackageModelFit extends PackageFit {
  bootstrap: BootstrapReport | null;
  /** Stated one-sigma uncertainty per parameter (0 for a parameter held fixed). */
  uncertainty: PackageParameters;
  /** RMS and largest colour residual over the builds, in MacAdam steps. */
  rmsSteps: number;
  maxSteps: number;
}

const larger = (a: number, b: number) => (Number.isFinite(a) && Number.isFinite(b) ? Math.max(a, b) : Number.isFinite(a) ? a : b);

export function fitPackageModel(
  basis: LoadingBasis,
  builds: PackageBuild[],
  opts: PackageFitOptions,
  bootstrap: { resamples?: number; seed?: number } | false = {}
): PackageModelFit {
  const fit = calibratePackage(basis, builds, opts);
  const boot = bootstrap === false ? null : bootstrapBuilds(basis, builds, opts, fit, bootstrap);
  const se = fit.standardErrors;
  const steps = fit.builds.map((b) => b.steps);
  return {
    ...fit,
    bootstrap: boot,
    uncertainty: {
      absorptionPerWtPctMm: se.absorptionPerWtPctMm.map((s, i) => larger(s, boot?.absorptionPerWtPctMm[i].sd ?? NaN)),
      pumpEscape: fit.fitted.escape ? larger(se.pumpEscape, boot?.pumpEscape.sd ?? NaN) : 0,
      iqeScale: fit.fitted.iqeScale ? larger(se.iqeScale, boot?.iqeScale.sd ?? NaN) : 0
    },
    rmsSteps: Math.sqrt(steps.reduce((a, s) => a + s * s, 0) / steps.length),
    maxSteps: Math.max(...steps)
  };
}
