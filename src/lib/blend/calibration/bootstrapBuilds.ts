/**
 * Bootstrap over builds: B. Efron, "Bootstrap methods: another look at the jackknife",
 * Ann. Statist. 7 (1979) 1–26. Resample the builds with replacement (same count), refit,
 * and report the spread of each parameter (standard deviation and the 2.5/97.5 % points of
 * the refits, Efron's percentile interval). Refits start warm from the full fit. A resample
 * that cannot be fitted (one loading only, no output for the IQE scale) or whose fit does not
 * converge is counted and left out, never silently replaced.
 * Random numbers: mulberry32, a 32-bit seeded generator (common practice), so a seed gives
 * the same report everywhere.
 */
import { BlendInputError } from '../errors';
import type { LoadingBasis } from '../loading/beerLambertPhotonBudget';
import type { PackageBuild } from './packageBuilds';
import { calibratePackage, type PackageFit, type PackageFitOptions } from './calibratePackage';

export interface Spread {
  sd: number;
  low: number;
  high: number;
}

export interface BootstrapReport {
  resamples: number;
  seed: number;
  /** Refits that converged and were used. */
  used: number;
  /** Refits refused (not identifiable) or not converged. */
  failed: number;
  absorptionPerWtPctMm: Spread[];
  pumpEscape: Spread;
  iqeScale: Spread;
}

export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function spread(values: number[]): Spread {
  if (values.length < 2) return { sd: NaN, low: NaN, high: NaN };
  const mean = values.reduce((a, v) => a + v, 0) / values.length;
  const sd = Math.sqrt(values.reduce((a, v) => a + (v - mean) ** 2, 0) / (values.length - 1));
  const sorted = values.slice().sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.round(q * (sorted.length - 1))))];
  return { sd, low: at(0.025), high: at(0.975) };
}

export function bootstrapBuilds(
  basis: LoadingBasis,
  builds: PackageBuild[],
  opts: PackageFitOptions,
  full: PackageFit,
  { resamples = 100, seed = 1 }: { resamples?: number; seed?: number } = {}
): BootstrapReport {
  const rnd = mulberry32(seed);
  const fits: PackageFit[] = [];
  let failed = 0;
  for (let k = 0; k < resamples; k++) {
    const sample = builds.map((_, i) => ({ ...builds[Math.floor(rnd() * builds.length)], label: `resample ${i + 1}` }));
    try {
      const fit = calibratePackage(basis, sample, { ...opts, start: full.parameters, warmStart: true });
      if (fit.converged) fits.push(fit);
      else failed++;
    } catch (err) {
      if (!(err instanceof BlendInputError)) throw err;
      failed++;
    }
  }
  const n = full.parameters.absorptionPerWtPctMm.length;
  return {
    resamples,
    seed,
    used: fits.length,
    failed,
    absorptionPerWtPctMm: Array.from({ length: n }, (_, i) => spread(fits.map((f) => f.parameters.absorptionPerWtPctMm[i]))),
    pumpEscape: full.fitted.escape
      ? spread(fits.map((f) => f.parameters.pumpEscape))
      : { sd: 0, low: full.parameters.pumpEscape, high: full.parameters.pumpEscape },
    iqeScale: full.fitted.iqeScale
      ? spread(fits.map((f) => f.parameters.iqeScale))
      : { sd: 0, low: full.parameters.iqeScale, high: full.parameters.iqeScale }
  };
}
