/**
 * The metrics of a part measured by an inline tester: what the table carries, nothing computed from
 * nothing. Chromaticity in the other space and, when the table lacks them, CCT and Duv follow from
 * the chromaticity (CIE 15:2004 §8.1 u′v′ ↔ x,y; Ohno 2014 CCT/Duv); Ra and R9 are the tester's or
 * "not measured"; metrics that need a spectrum (R1–R14 beyond R9, TM-30, LER, α-opic, FWHM) are absent.
 */
import { uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';
import type { PartMetrics } from '../measurements/types';
import type { TesterRow } from './parse';

// CIE 15:2004 eq. 8.10–8.12: u′ = 4x/(−2x + 12y + 3), v′ = 9y/(−2x + 12y + 3); x = 9u′/(6u′ − 16v′ + 12), y = 4v′/(6u′ − 16v′ + 12).
export function uvPrimeOfXy(x: number, y: number): [number, number] {
  const d = -2 * x + 12 * y + 3;
  return [(4 * x) / d, (9 * y) / d];
}
export function xyOfUvPrime(u: number, v: number): [number, number] {
  const d = 6 * u - 16 * v + 12;
  return [(9 * u) / d, (4 * v) / d];
}

export function testerPartMetrics(row: TesterRow, space: 'xy' | 'uvPrime'): PartMetrics {
  const [a, b] = row.chromaticity;
  const [x, y] = space === 'xy' ? [a, b] : xyOfUvPrime(a, b);
  const [uPrime, vPrime] = space === 'xy' ? uvPrimeOfXy(a, b) : [a, b];
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
