/** Shared test helpers: build spectra from the generated tables (no metric code involved). */
import type { Spd } from '../../src/lib/spectral/index';

export function tableSpd(values: readonly number[], startNm: number, stepNm: number): Spd {
  return { wavelengths: values.map((_, i) => startNm + i * stepNm), values: [...values] };
}

export function gridSpd(values: Float64Array): Spd {
  return { wavelengths: Array.from(values, (_, i) => 360 + i), values: Array.from(values) };
}

/** A sum of Gaussian bands on 380–780 nm at 1 nm: [peakNm, fwhmNm, amplitude]. */
export function bandsSpd(bands: [number, number, number][]): Spd {
  const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
  const values = wavelengths.map((l) => bands.reduce((s, [p, w, a]) => s + a * Math.exp(-0.5 * ((l - p) / (w / 2.3548)) ** 2), 0));
  return { wavelengths, values };
}
