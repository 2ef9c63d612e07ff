import { describe, expect, it } from 'vitest';
import { judgeBatch, partMetrics, recordMeasurementSummary, type MeasuredPart } from '../../../src/lib/measurements/index';
import { CIE_ILLUMINANT_A } from '../../../src/lib/spectral/data/cie-illuminants';
import type { AlphaOpicResult } from '../../../src/lib/spectral/types';
import { metricsAt } from './support';

const derOf = (melanopic: number): AlphaOpicResult => ({
  efficacyMwPerLm: { sCone: 0, mCone: 0, lCone: 0, rhodopic: 0, melanopic: 1.3262 * melanopic },
  der: { sCone: 0, mCone: 0, lCone: 0, rhodopic: 0, melanopic },
  melanopicEdiPer1000Lx: 1000 * melanopic
});

describe('melanopic DER of measured parts (CIE S 026/E:2018)', () => {
  it('is computed for every part from its spectrum', () => {
    const t = CIE_ILLUMINANT_A;
    const m = partMetrics({ wavelengths: t.values.map((_, i) => t.startNm + i * t.stepNm), values: [...t.values] });
    // Published CIE S 026 worked example: illuminant A at 100 lx has melanopic EDI 49.581 lx (DER 0.4958)
    expect(m.alphaOpic?.der.melanopic).toBeCloseTo(0.4958, 2);
  });

  it('is summarised as mean and spread, leaving out parts measured before it was computed', () => {
    const at = (alphaOpic?: AlphaOpicResult) => metricsAt(0.4339, 0.4033, alphaOpic ? { alphaOpic } : {});
    const parts: MeasuredPart[] = [
      { label: 'P1', metrics: at(derOf(0.44)) },
      { label: 'P2', metrics: at(derOf(0.46)) },
      { label: 'P3', metrics: at() }
    ];
    const batch = judgeBatch(
      parts,
      { kind: 'ansiBin', nominalCct: 3000 },
      { tolerance: { kind: 'sdcm', steps: 7 }, floors: {}, requireTargetBin: false }
    );
    const s = batch.summary.stats.melDer!;
    // ISO 3534-1:2006 §1.17 sample mean and SD (Bessel): mean 0.45, s = √((0.01² + 0.01²)/1) = 0.014142
    expect(s.n).toBe(2);
    expect(s.mean).toBeCloseTo(0.45, 12);
    expect(s.sd).toBeCloseTo(Math.SQRT2 * 0.01, 9);
    // The batch record prints it to three decimals (hand-worked from the values above)
    const rows = recordMeasurementSummary(batch.summary, batch.acceptance, '3000 K', null, null).rows;
    expect(rows.find((r) => r.label === 'Melanopic DER (CIE S 026)')?.value).toBe('0.450 (s 0.014, 0.440–0.460, n 2)');
  });
});
