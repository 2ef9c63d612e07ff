/**
 * Lot statistics where they are shown: the batch record rows (Cp/Cpk of CCT against the target's ANSI
 * quadrangle, hand-computed), the mean's confidence ellipse on the plot (every outline point at the
 * Hotelling T² distance from the mean), and the drift wording. Parts invented.
 */
import { describe, expect, it } from 'vitest';
import { chromaticityPlotModel, defaultAcceptance, judgeBatch } from '../../../../src/lib/measurements/index';
import { recordMeasurementSummary } from '../../../../src/lib/measurements/recordSummary';
import { lotStatistics, trendSeries } from '../../../../src/lib/measurements/lot-statistics/lot-statistics';
import { hotellingScale, mahalanobisSquared } from '../../../../src/lib/measurements/lot-statistics/confidence-ellipse';
import { describeDrift } from '../../../../src/lib/measurements/lot-statistics/format';
import { testerPartAt } from '../support';

const target = { kind: 'ansiBin', nominalCct: 3000 } as const;
const acceptance = defaultAcceptance({ target, tolerance: { kind: 'sdcm', steps: 3 }, floors: {} });
const part = testerPartAt;

describe('lot statistics on the batch record', () => {
  it('prints Cp and Cpk of CCT against the 3000 K quadrangle, hand-computed', () => {
    // CCT 2950, 3000, 3050, 3000 K: mean 3000, s = √(5000/3) = 40.82 K (hand-computed).
    // ANSI C78.377-2017 Table 1: 3000 K = 3045 ± 175 K → LSL 2870, USL 3220.
    // Cp = 350 / (6 · 40.82) = 1.43; Cpk = min(220, 130) / (3 · 40.82) = 1.06 (NIST/SEMATECH e-Handbook §6.1.6).
    const parts = [2950, 3000, 3050, 3000].map((cct, i) => part(i, 0.4338 + 0.0004 * (i % 2), 0.403 + 0.0003 * (i >> 1), cct));
    const batch = judgeBatch(parts, target, acceptance);
    const stats = lotStatistics(batch.parts, batch.target, acceptance.tolerance)!;
    const rows = recordMeasurementSummary(batch.summary, acceptance, '3000 K', null, null, null, [], stats).rows;
    const cct = rows.find((r) => r.label === 'Capability, CCT')!;
    expect(cct.value).toContain('Cp 1.43, Cpk 1.06');
    expect(cct.value).toContain('LSL 2870, USL 3220');
    expect(rows.find((r) => r.label === 'Parts per verdict')!.value).toMatch(/^pass \d+ \(/);
    expect(rows.some((r) => r.label === 'Mean point, confidence' && r.value.includes('Hotelling T², F(2, 2)'))).toBe(true);
    expect(rows.some((r) => r.label === 'Drift of CCT')).toBe(true);
  });
});

describe('the mean confidence ellipse on the plot', () => {
  it('draws an outline every point of which lies at the T² distance from the mean', () => {
    let s = 7;
    const rnd = () => (s = (s * 16807) % 2147483647) / 2147483647;
    const parts = Array.from({ length: 400 }, (_, i) =>
      part(i, 0.4338 + 0.004 * (rnd() - 0.5), 0.403 + 0.002 * (rnd() - 0.5) + 0.3 * 0.004 * (rnd() - 0.5))
    );
    const batch = judgeBatch(parts, target, acceptance);
    const e = lotStatistics(batch.parts, batch.target, acceptance.tolerance)!.ellipse!;
    const plot = chromaticityPlotModel(batch, [], null, e);
    // Johnson & Wichern (2007) eq. (5-18): the boundary is (p − x̄)ᵀ S⁻¹ (p − x̄) = c².
    const { c2 } = hotellingScale(e.n, e.level);
    for (const [x, y] of plot.meanConfidence!.points) expect(mahalanobisSquared({ x, y }, e.mean, e.covariance) / c2).toBeCloseTo(1, 3);
    expect(plot.meanConfidence!.label).toContain('95 % confidence ellipse of the mean');
  });
});

describe('drift wording', () => {
  it('calls a steady rise a drift and noise without a slope none', () => {
    // A rise of 1 K per part is 1,000 K per 1,000 parts; a repeating 0/1 pattern has no slope to speak of.
    const rising = trendSeries(
      Array.from({ length: 200 }, (_, i) => 3000 + i + (i % 3)),
      'cct',
      'CCT',
      'K'
    );
    expect(rising.slopePer1000!).toBeCloseTo(1000, -1);
    expect(describeDrift(rising)).toContain('a drift during the run');
    const flat = trendSeries(
      Array.from({ length: 200 }, (_, i) => 3000 + (i % 2)),
      'cct',
      'CCT',
      'K'
    );
    expect(describeDrift(flat)).toContain('no drift shown');
    expect(describeDrift(trendSeries([1, 2], 'cct', 'CCT', 'K'))).toBe('too few parts for a drift');
  });
});
