/**
 * Display colours of the 14 CIE 13.3 test colour samples [CIE13.3-1995] under CIE illuminant
 * D65 (CIE 15:2004 Table T.1 [CIE15-2004]), CIE 1931 2° observer, 360–830 nm at 1 nm.
 * Returned as XYZ relative to the D65 white with Y_white = 1 (the scale of colorjs.io's
 * 'xyz-d65' space); the UI converts to sRGB. Approximate: for swatches, not colorimetry.
 */
import { CIE_13_3_TCS } from '../data/cie-13-3-tcs';
import { CIE_D65 } from '../data/cie-d65';
import { tableToGrid } from '../grid';
import { tcsUnder } from './reference';

export interface TcsSwatch {
  name: string;
  /** X, Y, Z with the D65 white at Y = 1. */
  xyzD65: [number, number, number];
}

let cache: TcsSwatch[] | null = null;

export function tcsDisplayXyzD65(): TcsSwatch[] {
  if (cache) return cache.map((s) => ({ ...s, xyzD65: [...s.xyzD65] }));
  const d65 = tableToGrid(CIE_D65.values, CIE_D65.startNm, CIE_D65.stepNm);
  const set = tcsUnder(d65);
  cache = CIE_13_3_TCS.names.map((name, i) => ({
    name,
    xyzD65: [set.samples[3 * i] / 100, set.samples[3 * i + 1] / 100, set.samples[3 * i + 2] / 100]
  }));
  return tcsDisplayXyzD65();
}
