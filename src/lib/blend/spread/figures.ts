/**
 * Figures of a predicted cloud: share inside the ANSI C78.377 quadrangle, inside the n-step ellipses
 * around the target (MacAdam-type steps, `aim/distance.ts`), inside the revision's tolerance, and the
 * distribution (mean, σ, percentiles) of CCT, Duv (Ohno 2014, LEUKOS 10:47) and LER.
 */
import { colourDistance, stepEllipseAt, withinTolerance, type ColourCentre, type Tolerance } from '../../aim/distance';
import { isInQuadrangle, type AnsiQuadrangle } from '../../spectral/ansi/c78377';
import { sdcmSteps } from '../../spectral/ansi/macadam';
import { xyToUv } from '../../spectral/colorimetry/chromaticity';
import { uvToCct } from '../../spectral/cct/index';

export const STEP_RINGS = [1, 2, 3, 5, 7] as const;

export interface Distribution {
  mean: number;
  sd: number;
  p5: number;
  p50: number;
  p95: number;
}

export interface YieldFigures {
  parts: number;
  /** Share (0–1) inside the ANSI quadrangle; null when the target names none. */
  inAnsiQuadrangle: number | null;
  /** Share inside each n-step ellipse around the target, n in STEP_RINGS. */
  inSteps: { steps: number; share: number }[];
  /** Share inside the revision's tolerance; null when none given. */
  inTolerance: number | null;
  cct: Distribution;
  duv: Distribution;
  ler: Distribution;
  /** Mean steps from the target. */
  meanSteps: number;
}

/** Mean, σ (N − 1) and nearest-rank percentiles. */
export function distributionOf(values: ArrayLike<number>): Distribution {
  const n = values.length;
  const sorted = Float64Array.from(values).sort();
  let s = 0;
  for (let i = 0; i < n; i++) s += sorted[i];
  const mean = n ? s / n : NaN;
  let q = 0;
  for (let i = 0; i < n; i++) q += (sorted[i] - mean) ** 2;
  const pct = (p: number): number => (n ? sorted[Math.min(n - 1, Math.max(0, Math.ceil((p / 100) * n) - 1))] : NaN);
  return { mean, sd: n > 1 ? Math.sqrt(q / (n - 1)) : 0, p5: pct(5), p50: pct(50), p95: pct(95) };
}

/** Steps of each point from `centre` (1-step ellipse at the centre's CCT unless given). */
export function stepsFrom(x: ArrayLike<number>, y: ArrayLike<number>, centre: ColourCentre, ellipse = stepEllipseAt(centre)): Float64Array {
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = sdcmSteps(x[i], y[i], ellipse);
  return out;
}

/** Share of `steps` at or below each ring (the ellipse boundary counts as inside). */
export function shareWithinSteps(steps: ArrayLike<number>, rings: readonly number[] = STEP_RINGS): { steps: number; share: number }[] {
  return rings.map((r) => {
    let k = 0;
    for (let i = 0; i < steps.length; i++) if (steps[i] <= r + 1e-12) k++;
    return { steps: r, share: steps.length ? k / steps.length : 0 };
  });
}

export function yieldFigures(
  cloud: { x: Float64Array; y: Float64Array; ler: Float64Array },
  centre: ColourCentre,
  quadrangle: AnsiQuadrangle | null,
  tolerance: Tolerance | null
): YieldFigures {
  const n = cloud.x.length;
  const steps = stepsFrom(cloud.x, cloud.y, centre);
  const cct = new Float64Array(n);
  const duv = new Float64Array(n);
  let inQ = 0;
  let inTol = 0;
  let sumSteps = 0;
  for (let i = 0; i < n; i++) {
    const r = uvToCct(...xyToUv(cloud.x[i], cloud.y[i]));
    cct[i] = r.cct;
    duv[i] = r.duv;
    if (quadrangle && isInQuadrangle(cloud.x[i], cloud.y[i], quadrangle)) inQ++;
    if (tolerance && withinTolerance(colourDistance(cloud.x[i], cloud.y[i], centre), tolerance)) inTol++;
    sumSteps += steps[i];
  }
  return {
    parts: n,
    inAnsiQuadrangle: quadrangle ? inQ / n : null,
    inSteps: shareWithinSteps(steps),
    inTolerance: tolerance ? inTol / n : null,
    cct: distributionOf(cct),
    duv: distributionOf(duv),
    ler: distributionOf(cloud.ler),
    meanSteps: n ? sumSteps / n : 0
  };
}
