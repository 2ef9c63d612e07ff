/**
 * Fast sample integrals for reflectance tables tabulated on a coarse uniform grid (5 nm).
 * With a reflectance R linearly interpolated between knots λ_k onto the 1 nm grid,
 *   Σ_λ S(λ) c̄(λ) R(λ) = Σ_k R(λ_k) · W_k,   W_k = Σ_λ S(λ) c̄(λ) h_k(λ)
 * where h_k is the linear "hat" of knot k. The W_k (3 per knot: x̄, ȳ, z̄) are computed once
 * per spectrum; each sample then costs one short dot product per channel. Exactly equal to
 * interpolating the table to 1 nm and summing (no approximation).
 */
import { GRID_START_NM } from '../grid';
import type { CmfGrid } from '../colorimetry/cmf';

export interface KnotTable {
  /** Number of samples. */
  samples: number;
  /** Number of knots. */
  knots: number;
  /** First knot wavelength (nm) and knot step (nm, integer). */
  startNm: number;
  stepNm: number;
  /** Reflectances, sample-major: values[s * knots + k]. */
  values: Float64Array;
}

export function makeKnotTable(series: readonly (readonly number[])[], startNm: number, stepNm: number): KnotTable {
  const knots = series[0].length;
  const values = new Float64Array(series.length * knots);
  series.forEach((s, i) => values.set(s, i * knots));
  return { samples: series.length, knots, startNm, stepNm, values };
}

/**
 * Knot weights for the three CMF channels: out[3k + c]. Also returns Σ S c̄ over the knot span
 * (the white) in `white` (length 3).
 */
export function knotWeights(spd: Float64Array, cmf: CmfGrid, table: KnotTable, out: Float64Array, white: Float64Array): void {
  const { knots, startNm, stepNm } = table;
  out.fill(0, 0, 3 * knots);
  white[0] = 0;
  white[1] = 0;
  white[2] = 0;
  const first = startNm - GRID_START_NM;
  const last = first + (knots - 1) * stepNm;
  const { xBar, yBar, zBar } = cmf;
  const invStep = 1 / stepNm;
  for (let i = first; i <= last; i++) {
    const s = spd[i];
    if (s === 0) continue;
    const wx = s * xBar[i];
    const wy = s * yBar[i];
    const wz = s * zBar[i];
    white[0] += wx;
    white[1] += wy;
    white[2] += wz;
    const r = i - first;
    const k = (r / stepNm) | 0;
    const f = (r - k * stepNm) * invStep;
    const g = 1 - f;
    const o = 3 * k;
    out[o] += wx * g;
    out[o + 1] += wy * g;
    out[o + 2] += wz * g;
    if (f > 0) {
      out[o + 3] += wx * f;
      out[o + 4] += wy * f;
      out[o + 5] += wz * f;
    }
  }
}

/** Sample tristimulus sums: out[3s + c] = Σ_k R_s(λ_k) W_{k,c}, scaled by `scale`. */
export function sampleSums(table: KnotTable, weights: Float64Array, scale: number, out: Float64Array): void {
  const { samples, knots, values } = table;
  for (let s = 0; s < samples; s++) {
    let x = 0;
    let y = 0;
    let z = 0;
    const base = s * knots;
    for (let k = 0; k < knots; k++) {
      const r = values[base + k];
      const o = 3 * k;
      x += r * weights[o];
      y += r * weights[o + 1];
      z += r * weights[o + 2];
    }
    out[3 * s] = x * scale;
    out[3 * s + 1] = y * scale;
    out[3 * s + 2] = z * scale;
  }
}
