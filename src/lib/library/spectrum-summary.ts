/**
 * What the library shows about one material spectrum: shape (peak, FWHM, centroid; CIE 127
 * definitions as implemented in the spectral core) and colour (CIE 1931 x,y; CIE 1976 u′v′;
 * LER; α-opic metrics of CIE S 026/E:2018; CCT/Duv by Ohno 2014 only near the Planckian locus, |Duv| ≤ 0.05, and within
 * 1000–20 000 K, where CCT means something [common practice]). Pure; throws SpectrumInputError on an unusable spectrum.
 */
import { evaluateGrid } from '../spectral/evaluate';
import { resampleToGrid } from '../spectral/resample';
import type { AlphaOpicResult, Spd } from '../spectral/types';

import { cctMeaningful } from '../spectral/meaningful';

export { CCT_DUV_LIMIT, CCT_RANGE_K } from '../spectral/meaningful';

export interface SpectrumSummary {
  peakNm: number;
  fwhmNm: number;
  centroidNm: number;
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  lerLmPerW: number;
  /** α-opic efficacies, DERs and melanopic EDI per 1,000 lx of this spectrum alone (CIE S 026/E:2018). */
  alphaOpic: AlphaOpicResult;
  /** Null far from the Planckian locus. */
  cctK: number | null;
  duv: number | null;
}

export function summariseSpectrum(spd: Spd): SpectrumSummary {
  const e = evaluateGrid(resampleToGrid(spd), { cri: false, tm30: false });
  const nearLocus = cctMeaningful(e.cct, e.duv);
  return {
    peakNm: e.peakNm,
    fwhmNm: e.fwhmNm,
    centroidNm: e.centroidNm,
    x: e.x,
    y: e.y,
    uPrime: e.uPrime,
    vPrime: e.vPrime,
    lerLmPerW: e.ler,
    alphaOpic: e.alphaOpic,
    cctK: nearLocus ? e.cct : null,
    duv: nearLocus ? e.duv : null
  };
}
