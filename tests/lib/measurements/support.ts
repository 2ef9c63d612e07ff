/** Shared builders of the quality tests (part metrics from a colour point; no metric code involved). */
import type { PartMetrics } from '../../../src/lib/measurements/index';
import { xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';
import { testerPartMetrics } from '../../../src/lib/tester-table/part-metrics';

/** Metrics of a part at (x, y) with good colour rendering unless overridden. */
export function metricsAt(x: number, y: number, over: Partial<PartMetrics> = {}): PartMetrics {
  const [uPrime, vPrime] = xyToUvPrime(x, y);
  return {
    x,
    y,
    uPrime,
    vPrime,
    cct: 3000,
    duv: 0,
    ra: 92,
    r9: 60,
    ri: [],
    criValid: true,
    rf: 90,
    rg: 100,
    ler: 300,
    peakNm: 450,
    fwhmNm: 20,
    centroidNm: 560,
    ...over
  };
}

/** A part as a tester table gives it: a label and x,y, optionally CCT; nothing else measured. */
export function testerPartAt(i: number, x: number, y: number, cct: number | null = null): { label: string; metrics: PartMetrics } {
  const row = { label: `P${i}`, line: i + 2, chromaticity: [x, y] as [number, number], cct, duv: null, ra: null, r9: null };
  return { label: row.label, metrics: testerPartMetrics({ ...row, fluxLm: null, forwardVoltageV: null, peakNm: null, bin: null }, 'xy') };
}
