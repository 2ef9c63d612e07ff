/**
 * Fast sample integrals for reflectance tables tabulated on a coarse uniform grid (5 nm).
 * With a reflectance R linearly interpolated between knots λ_k onto the 1 nm grid,
 *   Σ_λ S(λ) c̄(λ) R(λ) = Σ_k R(λ_k) · W_k,   W_k = Σ_λ S(λ) c̄(λ) h_k(λ)
 * where h_k is the linear "hat" of knot k. The W_k (one plane per channel x̄, ȳ, z̄) are computed
 * once per spectrum; each sample then costs one short dot product per channel. Exactly equal to
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

/** Knot weights of one spectrum: one plane per channel (x[k], y[k], z[k]) and Σ S c̄ over the span. */
export interface KnotWeights {
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  white: Float64Array;
}

export function makeKnotTable(series: readonly (readonly number[])[], startNm: number, stepNm: number): KnotTable {
  const knots = series[0].length;
  const values = new Float64Array(series.length * knots);
  series.forEach((s, i) => values.set(s, i * knots));
  return { samples: series.length, knots, startNm, stepNm, values };
}

export function newKnotWeights(table: KnotTable): KnotWeights {
  const n = table.knots;
  return { x: new Float64Array(n), y: new Float64Array(n), z: new Float64Array(n), white: new Float64Array(3) };
}

/** Grid indices (inclusive) of the first and last knot of a table. */
export function knotSpan(table: KnotTable): [number, number] {
  const first = table.startNm - GRID_START_NM;
  return [first, first + (table.knots - 1) * table.stepNm];
}

/** Knot weights of a spectrum on the grid for the three CMF channels, and its white over the knot span. */
export function knotWeights(spd: Float64Array, cmf: CmfGrid, table: KnotTable, out: KnotWeights): void {
  const { stepNm } = table;
  const { x, y, z, white } = out;
  x.fill(0);
  y.fill(0);
  z.fill(0);
  let wxSum = 0;
  let wySum = 0;
  let wzSum = 0;
  const [first, last] = knotSpan(table);
  const { xBar, yBar, zBar } = cmf;
  const invStep = 1 / stepNm;
  for (let i = first; i <= last; i++) {
    const s = spd[i];
    if (s === 0) continue;
    const wx = s * xBar[i];
    const wy = s * yBar[i];
    const wz = s * zBar[i];
    wxSum += wx;
    wySum += wy;
    wzSum += wz;
    const r = i - first;
    const k = (r / stepNm) | 0;
    const f = (r - k * stepNm) * invStep;
    const g = 1 - f;
    x[k] += wx * g;
    y[k] += wy * g;
    z[k] += wz * g;
    if (f > 0) {
      x[k + 1] += wx * f;
      y[k + 1] += wy * f;
      z[k + 1] += wz * f;
    }
  }
  white[0] = wxSum;
  white[1] = wySum;
  white[2] = wzSum;
}

/** Sample tristimulus sums: out[3s + c] = scale · Σ_k R_s(λ_k) W_{k,c}; two samples per pass share the weight loads. */
export function sampleSums(table: KnotTable, w: KnotWeights, scale: number, out: Float64Array): void {
  const { samples, knots, values } = table;
  const { x: wx, y: wy, z: wz } = w;
  let s = 0;
  for (; s + 1 < samples; s += 2) {
    let x0 = 0;
    let y0 = 0;
    let z0 = 0;
    let x1 = 0;
    let y1 = 0;
    let z1 = 0;
    const b0 = s * knots;
    const b1 = b0 + knots;
    for (let k = 0; k < knots; k++) {
      const r0 = values[b0 + k];
      const r1 = values[b1 + k];
      const a = wx[k];
      const b = wy[k];
      const c = wz[k];
      x0 += r0 * a;
      y0 += r0 * b;
      z0 += r0 * c;
      x1 += r1 * a;
      y1 += r1 * b;
      z1 += r1 * c;
    }
    const o = 3 * s;
    out[o] = x0 * scale;
    out[o + 1] = y0 * scale;
    out[o + 2] = z0 * scale;
    out[o + 3] = x1 * scale;
    out[o + 4] = y1 * scale;
    out[o + 5] = z1 * scale;
  }
  for (; s < samples; s++) {
    let x = 0;
    let y = 0;
    let z = 0;
    const b = s * knots;
    for (let k = 0; k < knots; k++) {
      const r = values[b + k];
      x += r * wx[k];
      y += r * wy[k];
      z += r * wz[k];
    }
    out[3 * s] = x * scale;
    out[3 * s + 1] = y * scale;
    out[3 * s + 2] = z * scale;
  }
}
