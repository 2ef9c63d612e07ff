/**
 * Confidence region of a lot's true mean chromaticity from Hotelling's T² (p = 2 coordinates):
 *   n (x̄ − μ)ᵀ S⁻¹ (x̄ − μ) ≤ p(n − 1)/(n − p) · F_{p, n−p}(level),
 * an ellipse centred on x̄ whose semi-axes lie along the eigenvectors eᵢ of S with half-lengths
 * √λᵢ · √(p(n − 1)/(n(n − p)) · F). Johnson & Wichern, Applied Multivariate Statistical Analysis,
 * 6th ed. (2007), §5.4, eq. (5-18) and the axes that follow it. S is the sample covariance (n − 1).
 * Eigenvalues of the symmetric 2 × 2 S in closed form (trace/determinant). Needs n ≥ 3 (n − p ≥ 1).
 * Units: CIE 1931 x,y; angle in degrees from +x.
 */
import { fQuantileTwoNumeratorDf } from './f-quantile';
import type { ConfidenceEllipse } from './types';

const P = 2;

export interface XyPoint {
  x: number;
  y: number;
}

/** Sample mean and covariance (n − 1), two-pass. */
// ISO 3534-1:2006 §1.17/§1.20 (sample variance and covariance with n − 1).
export function meanAndCovariance(points: readonly XyPoint[]): { mean: XyPoint; xx: number; xy: number; yy: number } {
  const n = points.length;
  let sx = 0;
  let sy = 0;
  for (const p of points) {
    sx += p.x;
    sy += p.y;
  }
  const mean = { x: sx / n, y: sy / n };
  let xx = 0;
  let xy = 0;
  let yy = 0;
  for (const p of points) {
    const dx = p.x - mean.x;
    const dy = p.y - mean.y;
    xx += dx * dx;
    xy += dx * dy;
    yy += dy * dy;
  }
  const d = n - 1;
  return { mean, xx: xx / d, xy: xy / d, yy: yy / d };
}

/** Scale c² of the region: (x̄ − μ)ᵀ S⁻¹ (x̄ − μ) ≤ c². */
// Johnson & Wichern (2007) eq. (5-18): c² = p(n − 1)/(n(n − p)) · F_{p,n−p}(level).
export function hotellingScale(n: number, level: number): { c2: number; f: number } {
  const f = fQuantileTwoNumeratorDf(n - P, level);
  return { c2: ((P * (n - 1)) / (n * (n - P))) * f, f };
}

/** The confidence ellipse of the mean, or null with fewer than 3 points or a singular covariance. */
// Johnson & Wichern (2007) §5.4: axes ±√λᵢ · c along the eigenvectors of S.
export function meanConfidenceEllipse(points: readonly XyPoint[], level = 0.95, target: XyPoint | null = null): ConfidenceEllipse | null {
  const n = points.length;
  if (n < P + 1) return null;
  const { mean, xx, xy, yy } = meanAndCovariance(points);
  const half = (xx + yy) / 2;
  const root = Math.hypot((xx - yy) / 2, xy);
  const l1 = half + root;
  const l2 = half - root;
  if (!(l2 > 0)) return null;
  const { c2, f } = hotellingScale(n, level);
  // Major axis angle: ½·atan2(2sxy, sxx − syy); for a circle (sxx = syy, sxy = 0) it is 0.
  const angleDeg = (0.5 * Math.atan2(2 * xy, xx - yy) * 180) / Math.PI;
  const covariance = { xx, xy, yy };
  return {
    n,
    level,
    mean,
    covariance,
    fQuantile: f,
    semiMajor: Math.sqrt(l1 * c2),
    semiMinor: Math.sqrt(l2 * c2),
    angleDeg,
    containsTarget: target ? mahalanobisSquared(target, mean, covariance) <= c2 : null
  };
}

/** (p − m)ᵀ S⁻¹ (p − m) for the 2 × 2 covariance S. */
// Johnson & Wichern (2007) eq. (1-22) (statistical distance), S⁻¹ of a 2 × 2 matrix by its adjugate.
export function mahalanobisSquared(p: XyPoint, m: XyPoint, s: ConfidenceEllipse['covariance']): number {
  const det = s.xx * s.yy - s.xy * s.xy;
  const dx = p.x - m.x;
  const dy = p.y - m.y;
  return (s.yy * dx * dx - 2 * s.xy * dx * dy + s.xx * dy * dy) / det;
}

/** True when μ lies inside the ellipse (the region covers the true mean). */
export function ellipseCovers(e: ConfidenceEllipse, mu: XyPoint): boolean {
  return mahalanobisSquared(mu, e.mean, e.covariance) <= hotellingScale(e.n, e.level).c2;
}
