import { describe, expect, it } from 'vitest';
import { opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { buildPartModel, NO_VARIATION, spreadBreakdown, variationModelSchema } from '../../../src/lib/blend/spread';
import { PUMP_PEAK_NM, TEST_CONCENTRATIONS, TEST_PATH_MM, testBasis } from './basis';

const basis = testBasis();
const part = buildPartModel(basis);
const recipe = { opticalDepths: opticalDepthsOf(basis, TEST_CONCENTRATIONS, TEST_PATH_MM), pumpPeakNm: PUMP_PEAK_NM };

describe('variance breakdown', () => {
  it('gives the whole spread to the only source that varies', () => {
    const model = { ...NO_VARIATION, slurryMassCvPct: 3 };
    const b = spreadBreakdown(part, recipe, model, 3000, 5);
    expect(b.sources.find((s) => s.source === 'slurryMass')?.share).toBe(1);
    expect(b.sumOverTotal).toBeCloseTo(1, 12);
  });

  it('for small independent sources the one-at-a-time traces add up to the full trace', () => {
    // First-order propagation: Cov = Σₖ Jₖ Jₖᵀ σₖ² is additive over independent sources (delta method,
    // Casella & Berger §5.5.4), so Σ traces / full trace → 1 within sampling error.
    const model = variationModelSchema.parse({
      slurryMassCvPct: 0.5,
      absorptionLotCvPct: 0.5,
      peakLotSigmaNm: 0.2,
      weighingTolerancePct: 0.5
    });
    const b = spreadBreakdown(part, recipe, model, 20_000, 8);
    expect(b.sources.reduce((s, x) => s + x.share, 0)).toBeCloseTo(1, 12);
    expect(Math.abs(b.sumOverTotal - 1)).toBeLessThan(0.06);
  });
});
