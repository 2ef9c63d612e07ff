/** Shared builders of the quality tests (part metrics from a colour point; no metric code involved). */
import type { PartMetrics } from '../../../src/lib/measurements/index';
import { xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';

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
