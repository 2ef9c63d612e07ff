/**
 * Shape descriptors of a spectrum on the working grid (360–830 nm, 1 nm); common practice
 * for LED datasheets (CIE 127:2007 defines peak wavelength and centroid [CIE127-2007]).
 *  peak:     wavelength of the maximum (first one if tied), refined by a parabola through
 *            the maximum and its neighbours (sub-nm), nm.
 *  centroid: Σ λ S(λ) / Σ S(λ), nm.
 *  FWHM:     width between the half-maximum crossings nearest the peak on each side
 *            (linear interpolation); for multi-band white spectra it is the width of the
 *            strongest band. nm.
 */
import { GRID_START_NM } from '../grid';

export interface SpectralShape {
  peakNm: number;
  centroidNm: number;
  fwhmNm: number;
}

export function spectralShape(spd: Float64Array): SpectralShape {
  const n = spd.length;
  let m = 0;
  let sum = 0;
  let moment = 0;
  for (let i = 0; i < n; i++) {
    if (spd[i] > spd[m]) m = i;
    sum += spd[i];
    moment += (GRID_START_NM + i) * spd[i];
  }
  const max = spd[m];
  let peak = GRID_START_NM + m;
  if (m > 0 && m < n - 1) {
    const a = spd[m - 1];
    const c = spd[m + 1];
    const den = a - 2 * max + c;
    if (den < 0) peak += (0.5 * (a - c)) / den;
  }
  const half = max / 2;
  let left = 0;
  for (let i = m; i > 0; i--) {
    if (spd[i - 1] < half) {
      left = i - (spd[i] - half) / (spd[i] - spd[i - 1]);
      break;
    }
  }
  let right = n - 1;
  for (let i = m; i < n - 1; i++) {
    if (spd[i + 1] < half) {
      right = i + (spd[i] - half) / (spd[i] - spd[i + 1]);
      break;
    }
  }
  return { peakNm: peak, centroidNm: moment / sum, fwhmNm: right - left };
}
