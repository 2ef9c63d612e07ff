/**
 * The metrics of a part measured by an inline tester: what the table carries, nothing computed from
 * nothing. Chromaticity in the other space and, when the table lacks them, CCT and Duv follow from
 * the chromaticity (CIE 15:2004 §8.1 u′v′ ↔ x,y; Ohno 2014 CCT/Duv); Ra and R9 are the tester's or
 * "not measured"; metrics that need a spectrum (R1–R14 beyond R9, TM-30, LER, α-opic, FWHM) are absent.
 */
import { uvToCct } from '../spectral/cct/index';
import { uvPrimeToXy, xyToUv, xyToUvPrime } from '../spectral/colorimetry/chromaticity';
import type { PartMetrics } from '../measurements/types';
import type { TesterRow } from './parse';

export function testerPartMetrics(row: TesterRow, space: 'xy' | 'uvPrime'): PartMetrics {
  const [a, b] = row.chromaticity;
  const [x, y] = space === 'xy' ? [a, b] : uvPrimeToXy(a, b);
  const [uPrime, vPrime] = space === 'xy' ? xyToUvPrime(a, b) : [a, b];
  const computed = row.cct === null || row.duv === null ? uvToCct(...xyToUv(x, y)) : null;
  const ri: (number | null)[] = Array.from({ length: 14 }, () => null);
  ri[8] = row.r9;
  return {
    x,
    y,
    uPrime,
    vPrime,
    cct: row.cct ?? computed!.cct,
    duv: row.duv ?? computed!.duv,
    ra: row.ra,
    r9: row.r9,
    ri,
    criValid: row.ra !== null || row.r9 !== null,
    rf: null,
    rg: null,
    ler: null,
    peakNm: row.peakNm,
    fwhmNm: null,
    centroidNm: null,
    source: 'table',
    fluxLm: row.fluxLm,
    forwardVoltageV: row.forwardVoltageV,
    testerBin: row.bin
  };
}
