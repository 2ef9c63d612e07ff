/**
 * The pump of one wavelength bin: the nominal pump moved so that its peak (or dominant wavelength,
 * CIE 15:2004 §9.1) sits at the bin centre. A shift moves the band without changing its shape
 * (common practice for chips of one wafer process); the dominant wavelength is matched by a few
 * secant steps, as it does not move one-for-one with the peak.
 */
import { prepareBasis } from '../basis';
import { shiftPump } from '../shiftPump';
import type { PumpSpec } from '../types';
import { dominantWavelength } from '../../spectral/colorimetry/dominant-wavelength';

/** Which wavelength a bin range states (as in the pump-bin sets of the library). */
export type WavelengthBasis = 'peak' | 'dominant';

function pumpWavelength(pump: PumpSpec, basis: WavelengthBasis): number {
  const prepared = prepareBasis({ pump, phosphors: [] }).components[0];
  if (basis === 'peak') return pump.parametric && !pump.spectrum ? pump.parametric.peakNm : prepared.peakNm;
  const [X, Y, Z] = prepared.xyz;
  const dom = dominantWavelength(X / (X + Y + Z), Y / (X + Y + Z));
  if (dom === null) throw new RangeError(`${pump.name}: no dominant wavelength (a purple stimulus)`);
  return dom;
}

/** How far the nominal pump is moved to put its stated wavelength at `centreNm`, and the moved pump. */
export function binPump(pump: PumpSpec, centreNm: number, basis: WavelengthBasis): { shiftNm: number; pump: PumpSpec } {
  const centre = centreNm;
  let shift = centre - pumpWavelength(pump, basis);
  if (basis === 'dominant') {
    for (let i = 0; i < 4; i++) {
      const miss = centre - pumpWavelength(shiftPump(pump, shift), basis);
      if (Math.abs(miss) < 0.01) break;
      shift += miss;
    }
  }
  return { shiftNm: shift, pump: shiftPump(pump, shift) };
}
