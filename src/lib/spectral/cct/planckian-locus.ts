/**
 * Planckian locus in CIE 1960 (u, v): exact values by integrating Planck's law
 * (`illuminants/planck.ts`, CIE 15:2004 constants) with the CIE 1931 2° CMFs over
 * 360–830 nm at 1 nm [CIE15-2004]; and the 1 %-step table of Ohno 2014 §2 [Ohno2014]
 * (T_i = 1000 K · 1.01^i up to ≥ 20 000 K, 303 rows) built once on first use.
 * Units: T in K; u, v dimensionless.
 */
import { CMF_1931_2DEG } from '../colorimetry/cmf';
import { GRID_LENGTH } from '../grid';
import { planckSpd } from '../illuminants/planck';

const buffer = new Float64Array(GRID_LENGTH);

/** CIE 1960 u,v of the Planckian radiator at T (K). */
export function planckianUv(temperatureK: number): [number, number] {
  const s = planckSpd(temperatureK, buffer);
  const { xBar, yBar, zBar } = CMF_1931_2DEG;
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    X += s[i] * xBar[i];
    Y += s[i] * yBar[i];
    Z += s[i] * zBar[i];
  }
  const d = X + 15 * Y + 3 * Z;
  return [(4 * X) / d, (6 * Y) / d];
}

export interface LocusTable {
  t: Float64Array;
  u: Float64Array;
  v: Float64Array;
}

export const LOCUS_T_MIN_K = 1000;
export const LOCUS_T_MAX_K = 20000;
export const LOCUS_STEP_RATIO = 1.01;

/** Step ratio of the refinement table (0.1 %), see `ohno2014.ts`. */
export const FINE_STEP_RATIO = 1.001;

let coarse: LocusTable | null = null;
let fine: LocusTable | null = null;

function buildTable(ratio: number): LocusTable {
  const n = Math.ceil(Math.log(LOCUS_T_MAX_K / LOCUS_T_MIN_K) / Math.log(ratio)) + 3;
  const t = new Float64Array(n);
  const u = new Float64Array(n);
  const v = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    // Start one step below 1000 K so that 1000 K itself has a neighbour on each side.
    t[i] = (LOCUS_T_MIN_K / ratio) * ratio ** i;
    [u[i], v[i]] = planckianUv(t[i]);
  }
  return { t, u, v };
}

/** Ohno 2014 §2: Planckian table at 1 % geometric steps, 1000–20 000 K (one row past each end). */
export function ohnoLocusTable(): LocusTable {
  coarse ??= buildTable(LOCUS_STEP_RATIO);
  return coarse;
}

let fineDone: Uint8Array | null = null;

/**
 * The same locus at 0.1 % steps (about 3000 rows). Rows are filled lazily: call
 * `ensureFineRows(lo, hi)` before reading a range.
 */
export function fineLocusTable(): LocusTable {
  if (!fine) {
    const n = Math.ceil(Math.log(LOCUS_T_MAX_K / LOCUS_T_MIN_K) / Math.log(FINE_STEP_RATIO)) + 3;
    fine = { t: new Float64Array(n), u: new Float64Array(n), v: new Float64Array(n) };
    fineDone = new Uint8Array(n);
    for (let i = 0; i < n; i++) fine.t[i] = (LOCUS_T_MIN_K / FINE_STEP_RATIO) * FINE_STEP_RATIO ** i;
  }
  return fine;
}

/** Computes rows lo..hi of the fine table if not yet done. */
export function ensureFineRows(lo: number, hi: number): void {
  const table = fineLocusTable();
  const done = fineDone as Uint8Array;
  for (let i = lo; i <= hi; i++) {
    if (done[i]) continue;
    [table.u[i], table.v[i]] = planckianUv(table.t[i]);
    done[i] = 1;
  }
}

/** Index in the fine table of the row at or just below T (clamped). */
export function fineIndexBelow(temperatureK: number): number {
  const n = fineLocusTable().t.length;
  const i = Math.floor(Math.log((temperatureK * FINE_STEP_RATIO) / LOCUS_T_MIN_K) / Math.log(FINE_STEP_RATIO));
  return Math.min(Math.max(i, 0), n - 1);
}
