/**
 * Metrics of one measured part from its spectrum: every quantity of the spectral core
 * (`evaluateSpectrum`: CIE 15 colorimetry, Ohno 2014 CCT/Duv, CIE 13.3 CRI, CIE 224 / TM-30,
 * LER, α-opic metrics of CIE S 026/E:2018, peak/FWHM/centroid). Non-finite TM-30 values (far from white) become null so the
 * result stays JSON-safe. Throws SpectrumInputError for a spectrum the core refuses.
 * Parts are resampled into one reused grid buffer: nothing of the grid outlives the call.
 */
import { evaluateGrid } from '../spectral/evaluate';
import { GRID_LENGTH } from '../spectral/grid';
import { resampleToGridInto } from '../spectral/resample';
import type { Spd } from '../spectral/types';
import type { PartMetrics } from './types';

const grid = new Float64Array(GRID_LENGTH);

const finiteOrNull = (v: number | undefined): number | null => (v !== undefined && Number.isFinite(v) ? v : null);

export function partMetrics(spd: Spd): PartMetrics {
  const e = evaluateGrid(resampleToGridInto(spd, grid));
  return {
    x: e.x,
    y: e.y,
    uPrime: e.uPrime,
    vPrime: e.vPrime,
    cct: e.cct,
    duv: e.duv,
    ra: finiteOrNull(e.cri.ra),
    r9: finiteOrNull(e.cri.ri[8]),
    ri: e.cri.ri.map((r) => finiteOrNull(r)),
    criValid: e.cri.valid,
    rf: finiteOrNull(e.tm30.rf),
    rg: finiteOrNull(e.tm30.rg),
    rfh1: finiteOrNull(e.tm30.bins[0]?.rf ?? NaN),
    rcsh1: finiteOrNull(e.tm30.bins[0]?.rcs ?? NaN),
    ler: e.ler,
    alphaOpic: e.alphaOpic,
    peakNm: e.peakNm,
    fwhmNm: e.fwhmNm,
    centroidNm: e.centroidNm
  };
}
