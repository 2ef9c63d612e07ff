/**
 * CIE daylight illuminant (D series) at a given correlated colour temperature.
 * CIE 15:2004 §3.1, eq. 3.3–3.5 [CIE15-2004] (method of Judd et al. 1964 [Judd1964]):
 *   4000 K ≤ T ≤ 7000 K:  xD = −4.6070e9/T³ + 2.9678e6/T² + 0.09911e3/T + 0.244063
 *   7000 K < T ≤ 25000 K: xD = −2.0064e9/T³ + 1.9018e6/T² + 0.24748e3/T + 0.237040
 *   yD = −3.000 xD² + 2.870 xD − 0.275
 *   M = 0.0241 + 0.2562 xD − 0.7341 yD
 *   M1 = (−1.3515 − 1.7703 xD + 5.9114 yD)/M,  M2 = (0.0300 − 31.4424 xD + 30.0717 yD)/M
 *   S(λ) = S0(λ) + M1 S1(λ) + M2 S2(λ)
 * Deviations: M1, M2 are not rounded to 3 decimals (CIE 15 rounds them only to define the
 * tabulated D illuminants); T outside 4000–25000 K uses the nearest branch (extrapolation).
 * S0/S1/S2 (5 nm, 300–830 nm) are linearly interpolated to the 1 nm working grid.
 */
import { CIE_DAYLIGHT_COMPONENTS as D } from '../data/cie-daylight-components';
import { GRID_LENGTH, tableToGrid } from '../grid';

export const DAYLIGHT_S0: Float64Array = tableToGrid(D.s0, D.startNm, D.stepNm);
export const DAYLIGHT_S1: Float64Array = tableToGrid(D.s1, D.startNm, D.stepNm);
export const DAYLIGHT_S2: Float64Array = tableToGrid(D.s2, D.startNm, D.stepNm);

export interface DaylightCoefficients {
  xD: number;
  yD: number;
  m1: number;
  m2: number;
}

/** CIE 15:2004 eq. 3.3–3.5: chromaticity and S1/S2 weights of daylight at CCT T (K). */
export function daylightCoefficients(cctK: number): DaylightCoefficients {
  const t = cctK;
  const xD =
    t <= 7000
      ? -4.607e9 / t ** 3 + 2.9678e6 / t ** 2 + 0.09911e3 / t + 0.244063 // eq. 3.3a
      : -2.0064e9 / t ** 3 + 1.9018e6 / t ** 2 + 0.24748e3 / t + 0.23704; // eq. 3.3b
  const yD = -3.0 * xD * xD + 2.87 * xD - 0.275; // eq. 3.4
  const m = 0.0241 + 0.2562 * xD - 0.7341 * yD; // eq. 3.5
  const m1 = (-1.3515 - 1.7703 * xD + 5.9114 * yD) / m;
  const m2 = (0.03 - 31.4424 * xD + 30.0717 * yD) / m;
  return { xD, yD, m1, m2 };
}

/** Relative SPD of CIE daylight at CCT T (K) on the working grid (S0 + M1 S1 + M2 S2). */
export function daylightSpd(cctK: number, out: Float64Array = new Float64Array(GRID_LENGTH)): Float64Array {
  const { m1, m2 } = daylightCoefficients(cctK);
  for (let i = 0; i < GRID_LENGTH; i++) {
    out[i] = DAYLIGHT_S0[i] + m1 * DAYLIGHT_S1[i] + m2 * DAYLIGHT_S2[i];
  }
  return out;
}
