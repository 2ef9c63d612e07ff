/**
 * The working wavelength grid of the blend model: 1 nm steps, 360–830 nm (471 points),
 * the same grid as the spectral core (CIE 15:2004 recommends 360–830 nm; 1 nm step).
 *
 * `toGrid` reuses the core's resampler (`spectral/resample.ts`): validated input, linear
 * interpolation inside the measured range, zero outside, small negatives clamped.
 */
import { BlendInputError } from './errors';
import { resampleToGrid } from '../spectral/resample';
import { GRID_END_NM, GRID_LENGTH, GRID_START_NM, GRID_STEP_NM, GRID_WAVELENGTHS_NM } from '../spectral/grid';
import type { Spd } from './types';

export { GRID_END_NM, GRID_LENGTH, GRID_START_NM, GRID_STEP_NM };

/** Grid wavelengths (nm), shared and read-only by convention. */
export const GRID_NM: Float64Array = GRID_WAVELENGTHS_NM;

/** Resample an SPD onto the 1 nm grid with the core's rule; throws `SpectrumInputError`. */
export function toGrid(spd: Spd): Float64Array {
  return resampleToGrid(spd);
}

/** Radiant power of a gridded SPD (Σ S·Δλ, Δλ = 1 nm). */
export function radiantPower(values: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < values.length; i++) s += values[i];
  return s * GRID_STEP_NM;
}

/** Scale a gridded SPD to unit radiant power; throws on an all-zero spectrum. */
export function normaliseToUnitPower(values: Float64Array, label: string): Float64Array {
  const p = radiantPower(values);
  if (!(p > 0)) throw new BlendInputError(`${label}: spectrum has no power on 360–830 nm`);
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i] / p;
  return out;
}

/** Back to the JSON form. */
export function gridToSpd(values: ArrayLike<number>): Spd {
  return { wavelengths: Array.from(GRID_NM), values: Array.from(values) };
}

/** Power-weighted mean wavelength (nm) of a gridded SPD. */
export function centroidNm(values: ArrayLike<number>): number {
  let s = 0;
  let sw = 0;
  for (let i = 0; i < values.length; i++) {
    s += values[i];
    sw += values[i] * GRID_NM[i];
  }
  return s > 0 ? sw / s : NaN;
}
