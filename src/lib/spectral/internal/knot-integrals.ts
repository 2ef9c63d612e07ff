/**
 * Fast sample integrals for reflectance tables tabulated on a coarse uniform grid (5 nm).
 * With a reflectance R linearly interpolated between knots λ_k onto the 1 nm grid,
 *   Σ_λ S(λ) c̄(λ) R(λ) = Σ_k R(λ_k) · W_k,   W_k = Σ_λ S(λ) c̄(λ) h_k(λ)
 * where h_k is the linear "hat" of knot k. The W_k (one plane per channel x̄, ȳ, z̄) are computed
 * once per spectrum; each sample then costs one short dot product per channel. Exactly equal to
 * interpolating the table to 1 nm and summing (no approximation).
 * The table and the weights are plain arrays of doubles, not Float64Array: V8 (Node 20) runs the
 * inner product loops about a quarter faster on them (scripts/bench/spectral.bench.ts).
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
  values: number[];
}

/** Knot weights of one spectrum: one plane per channel (x[k], y[k], z[k]) and Σ S c̄ over the span. */
export interface KnotWeights {
  x: number[];
  y: number[];
  z: number[];
  white: Float64Array;
}

/** A plain array of n doubles (kept in V8's packed-double form: filled with a fraction first). */
function doubles(n: number): number[] {
  const a: number[] = [];
  for (let i = 0; i < n; i++) a.push(0.5);
  return a.fill(0);
}

export function makeKnotTable(series: readonly (readonly number[])[], startNm: number, stepNm: number): KnotTable {
  const knots = series[0].length;
  const values = doubles(series.length * knots);
  series.forEach((s, i) => s.forEach((v, k) => (values[i * knots + k] = v)));
  return { samples: series.length, knots, startNm, stepNm, values };
}

export function newKnotWeights(table: KnotTable): KnotWeights {
  const n = table.knots;
  return { x: doubles(n), y: doubles(n), z: doubles(n), white: new Float64Array(3) };
}

/** Grid indices (inclusive) of the first and last knot of a table. */
export function knotSpan(table: KnotTable): [number, number] {
  const first = table.startNm - GRID_START_NM;
  return [first, first + (table.knots - 1) * table.stepNm];
}

/** Knot weights of a spectrum on the grid for the three CMF channels, and its white over the knot span. */
export function knotWeights(spd: Float64Array, cmf: CmfGrid, table: KnotTable, out: KnotWeights): void {
  const { stepNm, knots } = table;
  const { x, y, z, white } = out;
  const { xBar, yBar, zBar } = cmf;
  const [first, last] = knotSpan(table);
  const invStep = 1 / stepNm;
  let wxSum = 0;
  let wySum = 0;
  let wzSum = 0;
  // Knot k collects (1 − f) of the grid points at and after it and f of those before it, f = offset / step.
  let xk = 0;
  let yk = 0;
  let zk = 0;
  for (let k = 0; k < knots - 1; k++) {
    let xn = 0;
    let yn = 0;
    let zn = 0;
    const base = first + k * stepNm;
    for (let d = 0; d < stepNm; d++) {
      const i = base + d;
      const s = spd[i];
      const wx = s * xBar[i];
      const wy = s * yBar[i];
      const wz = s * zBar[i];
      wxSum += wx;
      wySum += wy;
      wzSum += wz;
      const f = d * invStep;
      const g = 1 - f;
      xk += wx * g;
      yk += wy * g;
      zk += wz * g;
      xn += wx * f;
      yn += wy * f;
      zn += wz * f;
    }
    x[k] = xk;
    y[k] = yk;
    z[k] = zk;
    xk = xn;
    yk = yn;
    zk = zn;
  }
  const s = spd[last];
  const wx = s * xBar[last];
  const wy = s * yBar[last];
  const wz = s * zBar[last];
  x[knots - 1] = xk + wx;
  y[knots - 1] = yk + wy;
  z[knots - 1] = zk + wz;
  white[0] = wxSum + wx;
  white[1] = wySum + wy;
  white[2] = wzSum + wz;
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
