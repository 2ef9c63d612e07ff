/**
 * A pump moved to another wavelength: the parametric pump's peak moved, or a measured spectrum
 * translated along the wavelength axis. A shift of a few nm keeps the InGaN band's shape (common
 * practice: chip bins differ in peak, not in width); a bin's own measured spectrum, where there is
 * one, is used instead of a shifted one.
 */
import type { PumpSpec } from './types';

export function shiftPump(pump: PumpSpec, deltaNm: number): PumpSpec {
  if (!Number.isFinite(deltaNm)) throw new RangeError('shiftPump: the shift must be a finite number of nm');
  if (deltaNm === 0) return pump;
  if (pump.spectrum) {
    return { ...pump, spectrum: { wavelengths: pump.spectrum.wavelengths.map((w) => w + deltaNm), values: pump.spectrum.values.slice() } };
  }
  if (pump.parametric) return { ...pump, parametric: { ...pump.parametric, peakNm: pump.parametric.peakNm + deltaNm } };
  return pump;
}
