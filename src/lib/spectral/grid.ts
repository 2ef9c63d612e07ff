/**
 * The working wavelength grid of the spectral core: 360–830 nm at 1 nm (471 points),
 * the range of the CIE 1931 and CIE 1964 colour-matching function tables
 * [CIE-S014-1], [CIE15-2004]. Every spectrum is resampled onto it before integration
 * (rule in `resample.ts`). Integrals are plain sums with Δλ = 1 nm.
 */
export const GRID_START_NM = 360;
export const GRID_END_NM = 830;
export const GRID_STEP_NM = 1;
export const GRID_LENGTH = GRID_END_NM - GRID_START_NM + 1;

/** Grid index of a wavelength in nm (integer nm only). */
export function gridIndex(wavelengthNm: number): number {
  return wavelengthNm - GRID_START_NM;
}

/** Wavelengths of the grid, nm. */
export const GRID_WAVELENGTHS_NM: Float64Array = (() => {
  const w = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) w[i] = GRID_START_NM + i;
  return w;
})();

/**
 * Linear interpolation of a uniformly tabulated series onto the working grid; zero
 * outside the tabulated range. Used for the generated data tables (5 nm → 1 nm).
 */
export function tableToGrid(values: readonly number[], startNm: number, stepNm: number): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  const endNm = startNm + stepNm * (values.length - 1);
  for (let i = 0; i < GRID_LENGTH; i++) {
    const wl = GRID_START_NM + i;
    if (wl < startNm || wl > endNm) continue;
    const pos = (wl - startNm) / stepNm;
    const k = Math.min(Math.floor(pos), values.length - 2);
    const f = pos - k;
    out[i] = values[k] * (1 - f) + values[k + 1] * f;
  }
  return out;
}
