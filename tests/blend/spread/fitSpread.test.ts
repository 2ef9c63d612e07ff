import { describe, expect, it } from 'vitest';
import { opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { buildPartModel, simulateSpread, variationModelSchema } from '../../../src/lib/blend/spread';
import { fitSlurryMassCv } from '../../../src/lib/blend/spread/fitSpread';
import { PUMP_PEAK_NM, TEST_CONCENTRATIONS, TEST_PATH_MM, testBasis } from './basis';

const basis = testBasis();
const part = buildPartModel(basis);
const recipe = { opticalDepths: opticalDepthsOf(basis, TEST_CONCENTRATIONS, TEST_PATH_MM), pumpPeakNm: PUMP_PEAK_NM };

describe('fitSlurryMassCv', () => {
  it('recovers the slurry-mass CV of a batch simulated with a known CV', () => {
    // Round trip: a "measured" batch made with CV 3 % (other sources at their defaults) fits back to ≈ 3 %,
    // within the sampling error of a variance at N = 4000 (√(2/N) ≈ 2 % on the trace).
    const base = variationModelSchema.parse({ slurryMassCvPct: 1 });
    const batch = simulateSpread(part, recipe, { ...base, slurryMassCvPct: 3 }, 4000, 11);
    const fit = fitSlurryMassCv(part, recipe, base, batch, 20_000, 12);
    expect(fit.explained).toBe(true);
    expect(fit.model.slurryMassCvPct).toBeGreaterThan(2.6);
    expect(fit.model.slurryMassCvPct).toBeLessThan(3.4);
  });

  it('sets the CV to 0 when the other sources already exceed the measured spread', () => {
    const base = variationModelSchema.parse({});
    const tight = simulateSpread(
      part,
      recipe,
      variationModelSchema.parse({
        pump: { kind: 'uniform', halfRangeNm: 0.1 },
        slurryMassCvPct: 0,
        absorptionLotCvPct: 0,
        peakLotSigmaNm: 0
      }),
      500,
      1
    );
    const fit = fitSlurryMassCv(part, recipe, base, tight, 5000, 2);
    expect(fit.explained).toBe(false);
    expect(fit.model.slurryMassCvPct).toBe(0);
  });
});
