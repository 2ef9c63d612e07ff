/**
 * CCT and Duv from CIE 1960 (u, v) by the combined triangular/parabolic method of
 * Y. Ohno, "Practical Use and Calculation of CCT and Duv", LEUKOS 10(1):47–55, 2014,
 * doi:10.1080/15502724.2014.839020 [Ohno2014].
 * Search: nearest row of the 1 % Planckian table, 1000–20 000 K (Ohno 2014 §2), then a
 * cascade step (finer table around that row, as Ohno 2014 suggests for higher accuracy):
 * the three neighbouring rows of a 0.1 % table feed the triangular solution (§3.1) when
 * |Duv| < 0.002, else the parabolic solution (§3.2).
 * Deviation: with the 0.1 % cascade table the parabolic correction factor 0.99991 (derived by
 * Ohno for the 1 % table) becomes 1 − 0.00009/100 ≈ 1 (its bias scales with step²), so it
 * is not applied. Without the cascade the triangular solution drifts up to +2 K at 20 000 K.
 * Duv sign: + above the locus (v greater than the locus point), − below (ANSI C78.377).
 * Units: T in K; Duv in 1960 u,v units. Valid 1000–20 000 K, |Duv| ≤ 0.05 (stated accuracy
 * within 1 K for |Duv| ≤ 0.03); outside, results are extrapolated from the table ends.
 */
import { ensureFineRows, fineIndexBelow, fineLocusTable, ohnoLocusTable } from './planckian-locus';

export interface CctDuv {
  cct: number;
  duv: number;
}

function nearestRow(u: number, v: number, tu: Float64Array, tv: Float64Array, lo: number, hi: number): number {
  let m = lo;
  let best = Infinity;
  for (let i = lo; i <= hi; i++) {
    const du = u - tu[i];
    const dv = v - tv[i];
    const d2 = du * du + dv * dv;
    if (d2 < best) {
      best = d2;
      m = i;
    }
  }
  return m;
}

export function uvToCctOhno2014(u: number, v: number): CctDuv {
  // Ohno 2014 §2: distances d_i to every row of the 1 % table, m = argmin.
  const coarse = ohnoLocusTable();
  const mc = nearestRow(u, v, coarse.u, coarse.v, 0, coarse.t.length - 1);
  // Cascade: search the 0.1 % table between the coarse neighbours.
  const { t, u: tu, v: tv } = fineLocusTable();
  const n = t.length;
  const lo = fineIndexBelow(coarse.t[Math.max(mc - 1, 0)]);
  const hi = Math.min(fineIndexBelow(coarse.t[Math.min(mc + 1, coarse.t.length - 1)]) + 1, n - 1);
  ensureFineRows(Math.max(lo - 1, 0), Math.min(hi + 1, n - 1));
  let m = nearestRow(u, v, tu, tv, lo, hi);
  m = Math.min(Math.max(m, 1), n - 2);
  // Past either end of the table the clamp can step outside the rows searched: fill the three rows read.
  ensureFineRows(m - 1, m + 1);

  const t0 = t[m - 1];
  const t1 = t[m];
  const t2 = t[m + 1];
  const d0 = Math.hypot(u - tu[m - 1], v - tv[m - 1]);
  const d1 = Math.hypot(u - tu[m], v - tv[m]);
  const d2 = Math.hypot(u - tu[m + 1], v - tv[m + 1]);

  // Ohno 2014 §3.1 triangular solution: l = |P_{m+1} − P_{m−1}|, x = (d0² − d2² + l²)/(2l).
  const l = Math.hypot(tu[m + 1] - tu[m - 1], tv[m + 1] - tv[m - 1]);
  const x = (d0 * d0 - d2 * d2 + l * l) / (2 * l);
  const tTri = t0 + ((t2 - t0) * x) / l;
  const vTri = tv[m - 1] + ((tv[m + 1] - tv[m - 1]) * x) / l;
  const sign = v - vTri >= 0 ? 1 : -1;
  // Rounding can make d0² − x² slightly negative on the locus: clamp to 0.
  const duvTri = sign * Math.sqrt(Math.max(d0 * d0 - x * x, 0));
  if (Math.abs(duvTri) < 0.002) return { cct: tTri, duv: duvTri };

  // Ohno 2014 §3.2 parabolic solution: d(T) = a T² + b T + c through the three rows.
  const X = (t2 - t1) * (t0 - t2) * (t1 - t0);
  const a = (t0 * (d2 - d1) + t1 * (d0 - d2) + t2 * (d1 - d0)) / X;
  const b = -(t0 * t0 * (d2 - d1) + t1 * t1 * (d0 - d2) + t2 * t2 * (d1 - d0)) / X;
  const c = -(d0 * (t2 - t1) * t1 * t2 + d1 * (t0 - t2) * t0 * t2 + d2 * (t1 - t0) * t0 * t1) / X;
  const cct = -b / (2 * a);
  const duv = sign * (a * cct * cct + b * cct + c);
  return { cct, duv };
}
