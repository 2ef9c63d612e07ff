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

/** Inverse 5th powers of the grid wavelengths (in m) and c2/λ, precomputed for speed. */
const LAMBDA_M5 = new Float64Array(GRID_LENGTH);
const C2_OVER_LAMBDA = new Float64Array(GRID_LENGTH);
for (let i = 0; i < GRID_LENGTH; i++) {
  const lambdaM = (GRID_START_NM + i) * 1e-9;
  LAMBDA_M5[i] = 1 / lambdaM ** 5;
  C2_OVER_LAMBDA[i] = PLANCK_C2 / lambdaM;
}

/**
 * Planckian SPD on the working grid, scaled by 1e-13 to keep numbers near 1 (relative).
 * Writes into `out` when given (hot paths reuse a buffer).
 */
export function planckSpd(temperatureK: number, out: Float64Array = new Float64Array(GRID_LENGTH)): Float64Array {
  const invT = 1 / temperatureK;
  for (let i = 0; i < GRID_LENGTH; i++) {
    out[i] = (PLANCK_C1 * 1e-13 * LAMBDA_M5[i]) / Math.expm1(C2_OVER_LAMBDA[i] * invT);
  }
  return out;
}
