/**
 * Checks shared by the package calibration tests: a fit recovers the truth that generated its
 * builds (Levenberg 1944; Marquardt 1963), and a noisy fit's stated uncertainty covers the truth
 * (Efron 1979 for the bootstrap spread) [common practice for fit validation].
 */
import { expect } from 'vitest';
import type { PackageFit } from '../../src/lib/blend/calibration/calibratePackage';
import type { PackageModelFit } from '../../src/lib/blend/calibration/fitPackageModel';
import type { PackageParameters } from '../../src/lib/blend/calibration/packageLoadingModel';

/** Noiseless builds: every parameter to 1e-3 relative and every build within 0.01 step. */
export function expectRecovered(fit: PackageFit, truth: PackageParameters): void {
  expect(fit.converged).toBe(true);
  fit.parameters.absorptionPerWtPctMm.forEach((a, i) => expect(Math.abs(a / truth.absorptionPerWtPctMm[i] - 1)).toBeLessThan(1e-3));
  expect(Math.abs(fit.parameters.pumpEscape / truth.pumpEscape - 1)).toBeLessThan(1e-3);
  expect(Math.abs(fit.parameters.iqeScale / truth.iqeScale - 1)).toBeLessThan(1e-3);
  fit.builds.forEach((b) => expect(b.steps).toBeLessThan(0.01));
}

/** Noisy builds: each parameter within 3× its stated uncertainty, which is positive and below 25 %. */
export function expectWithinUncertainty(m: PackageModelFit, truth: PackageParameters): void {
  expect(m.converged).toBe(true);
  const check = (fitted: number, t: number, u: number) => {
    expect(u).toBeGreaterThan(0);
    expect(u / t).toBeLessThan(0.25); // the uncertainty says something
    expect(Math.abs(fitted - t)).toBeLessThanOrEqual(3 * u);
  };
  m.parameters.absorptionPerWtPctMm.forEach((a, i) => check(a, truth.absorptionPerWtPctMm[i], m.uncertainty.absorptionPerWtPctMm[i]));
  check(m.parameters.pumpEscape, truth.pumpEscape, m.uncertainty.pumpEscape);
  check(m.parameters.iqeScale, truth.iqeScale, m.uncertainty.iqeScale);
}
