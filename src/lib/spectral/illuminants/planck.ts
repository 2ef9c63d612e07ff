/**
 * Planckian (blackbody) radiator, relative spectral radiant exitance.
 * CIE 15:2004 §3.1 / eq. (Planck's law) [CIE15-2004]:
 *   M(λ, T) = c1 · λ^−5 · (exp(c2 / (λT)) − 1)^−1,
 * c1 = 3.74183e−16 W·m², c2 = 1.4388e−2 m·K (ITS-90 value adopted by CIE 15:2004), n = 1.
 * Units: λ in nm (converted to m), T in K; output W·m⁻³ (only relative values are used).
 * Valid for any T > 0; the core uses 500–100 000 K.
 */
import { GRID_LENGTH, GRID_START_NM } from '../grid';

export const PLANCK_C1 = 3.74183e-16;
export const PLANCK_C2 = 1.4388e-2;

/** Spectral exitance at one wavelength (nm) and temperature (K). */
export function planckExitance(wavelengthNm: number, temperatureK: number): number {
  const lambdaM = wavelengthNm * 1e-9;
  return PLANCK_C1 / (lambdaM ** 5 * Math.expm1(PLANCK_C2 / (lambdaM * temperatureK)));
}

/** c1 · 1e-13 / λ⁵ and c2/λ on the grid (λ in m), precomputed for speed. */
const SCALED_M5 = new Float64Array(GRID_LENGTH);
const C2_OVER_LAMBDA = new Float64Array(GRID_LENGTH);
for (let i = 0; i < GRID_LENGTH; i++) {
  const lambdaM = (GRID_START_NM + i) * 1e-9;
  SCALED_M5[i] = (PLANCK_C1 * 1e-13) / lambdaM ** 5;
  C2_OVER_LAMBDA[i] = PLANCK_C2 / lambdaM;
}

/**
 * Planckian SPD on the working grid, scaled by 1e-13 to keep numbers near 1 (relative).
 * Writes into `out` when given (hot paths reuse a buffer).
 */
export function planckSpd(temperatureK: number, out: Float64Array = new Float64Array(GRID_LENGTH)): Float64Array {
  return planckSpdSpan(temperatureK, out, 0, GRID_LENGTH - 1);
}

/** As `planckSpd`, but fills only grid indices first…last (inclusive) of `out`; the rest is left as it is. */
export function planckSpdSpan(temperatureK: number, out: Float64Array, first: number, last: number): Float64Array {
  const invT = 1 / temperatureK;
  for (let i = first; i <= last; i++) out[i] = SCALED_M5[i] / Math.expm1(C2_OVER_LAMBDA[i] * invT);
  return out;
}

const shared = new Float64Array(GRID_LENGTH);
let sharedK = NaN;
let sharedFirst = 0;
let sharedLast = -1;

/**
 * Planckian SPD at T over grid indices first…last, in a buffer shared by the callers that evaluate one
 * spectrum in turn (the CIE 13.3 and CIE 224 references are both Planckian at the same CCT): computed once
 * per temperature and span. Read it at once; the next call for another temperature overwrites it.
 */
export function planckSpdShared(temperatureK: number, first = 0, last = GRID_LENGTH - 1): Float64Array {
  if (temperatureK !== sharedK || first < sharedFirst || last > sharedLast) {
    planckSpdSpan(temperatureK, shared, first, last);
    sharedK = temperatureK;
    sharedFirst = first;
    sharedLast = last;
  }
  return shared;
}
