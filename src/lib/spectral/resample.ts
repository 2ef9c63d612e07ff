/**
 * Validation and resampling of a measured spectrum onto the working grid
 * (360–830 nm, 1 nm; see `grid.ts`).
 *
 * Interpolation rule: linear interpolation between measured points inside the measured
 * range; ZERO outside it (no extrapolation). CIE 15:2004 §7.2 [CIE15-2004] recommends
 * Lagrange/Sprague interpolation for 5 nm data and allows linear interpolation; linear is
 * used here because measured LED spectra are mostly at ≤ 1–2 nm and it keeps lines local.
 *
 * Input rules (each failure throws `SpectrumInputError` with a message saying what is wrong):
 * equal lengths, ≥ 5 points, strictly increasing wavelengths, finite numbers, wavelengths
 * within 300–900 nm, some power inside 360–830 nm, no value below −1 % of the maximum.
 * Small negatives (dark-subtraction noise, ≥ −1 % of max) are clamped to 0.
 * Units: wavelengths in nm, values in any relative spectral power unit. Every metric is
 * scale-free, so a spectrum whose maximum lies outside 1e−150…1e150 (where sums over the grid
 * would overflow to Infinity or underflow to 0) is resampled relative to its maximum.
 */
import { SpectrumInputError } from './errors';
import { GRID_LENGTH, GRID_START_NM } from './grid';
import type { Spd } from './types';

export const MIN_POINTS = 5;
export const MIN_WAVELENGTH_NM = 300;
export const MAX_WAVELENGTH_NM = 900;
/** Negative values down to this fraction of the maximum count as noise and are clamped. */
export const NEGATIVE_NOISE_FRACTION = 0.01;
/** Maxima beyond this factor from 1 are scaled to 1 before resampling (sums of 471 products stay finite and non-zero). */
const SAFE_SCALE = 1e150;

function isNumberArray(value: unknown): value is number[] {
  return Array.isArray(value) || ArrayBuffer.isView(value);
}

/** Checks a caller-supplied spectrum; throws `SpectrumInputError` on the first problem. */
export function validateSpd(spd: unknown): asserts spd is Spd {
  if (typeof spd !== 'object' || spd === null) {
    throw new SpectrumInputError('spectrum must be an object { wavelengths, values }');
  }
  const { wavelengths, values } = spd as { wavelengths?: unknown; values?: unknown };
  if (!isNumberArray(wavelengths) || !isNumberArray(values)) {
    throw new SpectrumInputError('wavelengths and values must both be arrays of numbers');
  }
  if (wavelengths.length !== values.length) {
    throw new SpectrumInputError(`wavelengths (${wavelengths.length}) and values (${values.length}) differ in length`);
  }
  if (wavelengths.length < MIN_POINTS) {
    throw new SpectrumInputError(`spectrum has ${wavelengths.length} points; at least ${MIN_POINTS} are needed`);
  }
  let max = -Infinity;
  for (let i = 0; i < wavelengths.length; i++) {
    const w = wavelengths[i];
    const p = values[i];
    if (typeof w !== 'number' || !Number.isFinite(w)) {
      throw new SpectrumInputError(`wavelength at index ${i} is not a finite number`);
    }
    if (typeof p !== 'number' || !Number.isFinite(p)) {
      throw new SpectrumInputError(`value at index ${i} (${w} nm) is not a finite number`);
    }
    if (w < MIN_WAVELENGTH_NM || w > MAX_WAVELENGTH_NM) {
      throw new SpectrumInputError(`wavelength ${w} nm at index ${i} is outside ${MIN_WAVELENGTH_NM}–${MAX_WAVELENGTH_NM} nm`);
    }
    if (i > 0 && !(w > wavelengths[i - 1])) {
      throw new SpectrumInputError(`wavelengths must increase strictly: ${wavelengths[i - 1]} nm then ${w} nm at index ${i}`);
    }
    if (p > max) max = p;
  }
  if (!(max > 0)) {
    throw new SpectrumInputError('spectrum has zero power (no positive value)');
  }
  for (let i = 0; i < values.length; i++) {
    if (values[i] < -NEGATIVE_NOISE_FRACTION * max) {
      throw new SpectrumInputError(`negative power ${values[i]} at ${wavelengths[i]} nm is below −1 % of the maximum (${max})`);
    }
  }
}

/**
 * Resamples a validated spectrum onto the 1 nm grid 360–830 nm: linear inside the measured
 * range, zero outside; negatives (noise) clamped to 0; relative to the maximum when that is
 * extreme (see the header). Throws when no power falls in 360–830 nm.
 */
export function resampleToGrid(spd: Spd): Float64Array {
  return resampleToGridInto(spd, new Float64Array(GRID_LENGTH));
}

/** As `resampleToGrid`, into a caller's buffer of GRID_LENGTH values (callers evaluating many spectra reuse one). */
export function resampleToGridInto(spd: Spd, out: Float64Array): Float64Array {
  validateSpd(spd);
  const { wavelengths, values } = spd;
  const scale = scaleOf(values);
  const n = wavelengths.length;
  const first = wavelengths[0];
  const lastNm = wavelengths[n - 1];
  let k = 0;
  let total = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const wl = GRID_START_NM + i;
    if (wl < first || wl > lastNm) {
      out[i] = 0;
      continue;
    }
    while (k < n - 2 && wavelengths[k + 1] < wl) k++;
    const w0 = wavelengths[k];
    const f = (wl - w0) / (wavelengths[k + 1] - w0);
    const v0 = scale === 1 ? values[k] : values[k] / scale; // divide: 1/scale overflows for subnormal maxima
    const v1 = scale === 1 ? values[k + 1] : values[k + 1] / scale;
    const p = v0 * (1 - f) + v1 * f;
    const clamped = p > 0 ? p : 0;
    out[i] = clamped;
    total += clamped;
  }
  if (!(total > 0)) {
    throw new SpectrumInputError('spectrum has no power inside 360–830 nm');
  }
  return out;
}

/** 1 for ordinary magnitudes (the values pass unchanged); the maximum when it is extreme. */
function scaleOf(values: ArrayLike<number>): number {
  let max = 0;
  for (let i = 0; i < values.length; i++) if (values[i] > max) max = values[i];
  return max > SAFE_SCALE || max < 1 / SAFE_SCALE ? max : 1;
}
