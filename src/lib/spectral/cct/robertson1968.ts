/**
 * CCT from CIE 1960 (u, v) by isotemperature lines:
 * A. R. Robertson, "Computation of Correlated Color Temperature and Distribution
 * Temperature", J. Opt. Soc. Am. 58(11):1528–1535, 1968 [Robertson1968].
 * 31 isotemperature lines at 0–600 mired (reciprocal megakelvin); for each line i through
 * the locus point (u_i, v_i) with slope t_i, the signed distance
 *   d_i = ((v − v_i) − t_i (u − u_i)) / √(1 + t_i²)          (Robertson 1968 eq. 5)
 * changes sign between the two lines bracketing the test point; the reciprocal temperature is
 * interpolated linearly in d: μ = μ_i + (μ_{i+1} − μ_i) · d_i / (d_i − d_{i+1}).
 * Deviation: the line table is regenerated from the current Planckian locus (CIE 15:2004
 * c2 = 1.4388e−2 m·K, 1 nm CMFs) instead of the 1968 printed table (older c2); the isotemperature
 * lines are the normals of that locus. No Duv (use Ohno 2014). For cross-checks only.
 * Units: T in K; valid about 1667 K – ∞ near the locus (|Duv| ≲ 0.02).
 */
import { planckianUv } from './planckian-locus';

export const ROBERTSON_MIREDS = [
  1e-10, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100, 125, 150, 175, 200, 225, 250, 275, 300, 325, 350, 375, 400, 425, 450, 475, 500, 525, 550,
  575, 600
];

export interface IsotemperatureLine {
  mired: number;
  u: number;
  v: number;
  /** Slope dv/du of the isotemperature line (normal to the locus). */
  t: number;
}

let lines: IsotemperatureLine[] | null = null;

export function robertsonLines(): IsotemperatureLine[] {
  if (lines) return lines;
  lines = ROBERTSON_MIREDS.map((mired) => {
    const tK = 1e6 / mired;
    const [u, v] = planckianUv(tK);
    // Locus tangent by a small step in mired; the isotemperature line is its normal.
    const dMired = 0.01;
    const [u1, v1] = planckianUv(1e6 / (mired + dMired));
    const du = u1 - u;
    const dv = v1 - v;
    return { mired, u, v, t: -du / dv };
  });
  return lines;
}

/** CCT in K; NaN when the point lies beyond the 0–600 mired lines (T < 1667 K). */
export function uvToCctRobertson1968(u: number, v: number): number {
  const table = robertsonLines();
  let prev = 0;
  for (let i = 0; i < table.length; i++) {
    const { u: ui, v: vi, t } = table[i];
    const d = (v - vi - t * (u - ui)) / Math.sqrt(1 + t * t);
    if (i > 0 && ((prev <= 0 && d > 0) || (prev >= 0 && d < 0))) {
      const m0 = table[i - 1].mired;
      const m1 = table[i].mired;
      const mired = m0 + ((m1 - m0) * prev) / (prev - d);
      return 1e6 / mired;
    }
    prev = d;
  }
  return Number.NaN;
}
