/**
 * What the library shows about one material spectrum: shape (peak, FWHM, centroid; CIE 127
 * definitions as implemented in the spectral core) and colour (CIE 1931 x,y; CIE 1976 u′v′;
 * LER; CCT/Duv by Ohno 2014 only near the Planckian locus, |Duv| ≤ 0.05, and within
 * 1000–20 000 K, where CCT means something [common practice]). Pure; throws SpectrumInputError on an unusable spectrum.
 */
import { evaluateGrid } from '../spectral/evaluate';
import { resampleToGrid } from '../spectral/resample';
import type { Spd } from '../spectral/types';

export const CCT_DUV_LIMIT = 0.05;
export const CCT_RANGE_K: [number, number] = [1000, 20_000];

export interface SpectrumSummary {
  peakNm: number;
  fwhmNm: number;
  centroidNm: number;
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  lerLmPerW: number;
  /** Null far from the Planckian locus. */
  cctK: number | null;
  duv: number | null;
}

export function summariseSpectrum(spd: Spd): SpectrumSummary {
  const e = evaluateGrid(resampleToGrid(spd), { cri: false, tm30: false });
  const nearLocus = Number.isFinite(e.duv) && Math.abs(e.duv) <= CCT_DUV_LIMIT && e.cct >= CCT_RANGE_K[0] && e.cct <= CCT_RANGE_K[1];
  return {
    peakNm: e.peakNm,
    fwhmNm: e.fwhmNm,
    centroidNm: e.centroidNm,
    x: e.x,
    y: e.y,
    uPrime: e.uPrime,
    vPrime: e.vPrime,
    lerLmPerW: e.ler,
    cctK: nearLocus ? e.cct : null,
    duv: nearLocus ? e.duv : null
  };
}
