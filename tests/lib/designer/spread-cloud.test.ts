/**
 * The designer's cloud job (run in the web worker): seeded runs repeat exactly, with no variation the
 * cloud collapses to the blend's own point on the loading model and the yield is 0 or 100 %, and shares
 * given without wt % are turned into the same wt % the loading model would solve (Beer–Lambert).
 */
import { describe, expect, it } from 'vitest';
import { runSpreadJob, type SpreadJob } from '../../../src/lib/designer/spread-cloud';
import { pumpPeakNm } from '../../../src/lib/blend/spread';
import { NO_VARIATION, variationModelSchema, buildPartModel, partXyz } from '../../../src/lib/blend/spread';
import { beerLambertPhotonBudget, opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { PUMP_PEAK_NM, TEST_CONCENTRATIONS, TEST_PATH_MM, testBasis } from '../../blend/spread/basis';

const basis = testBasis();
const centre = { x: 0.4338, y: 0.403, cct: 3000 };
const job = (over: Partial<SpreadJob> = {}): SpreadJob => ({
  id: 1,
  fractions: [],
  wtPct: TEST_CONCENTRATIONS,
  pathLengthMm: TEST_PATH_MM,
  centre,
  quadrangle: null,
  tolerance: { kind: 'sdcm', steps: 3 },
  model: variationModelSchema.parse({}),
  parts: 2000,
  seed: 7,
  ...over
});
const ok = (r: ReturnType<typeof runSpreadJob>) => {
  if (!r.ok) throw new Error(r.error);
  return r;
};

describe('designer cloud job', () => {
  it('finds the pump peak on the grid', () => {
    expect(pumpPeakNm(basis)).toBe(PUMP_PEAK_NM);
  });

  it('repeats exactly for the same seed', () => {
    const a = ok(runSpreadJob(basis, job()));
    const b = ok(runSpreadJob(basis, job({ id: 2 })));
    expect(Array.from(b.x)).toEqual(Array.from(a.x));
    expect(b.figures).toEqual(a.figures);
    expect(a.x).toHaveLength(2000);
  });

  it('collapses to the nominal point with no variation; the yield is 0 or 100 %', () => {
    const none = NO_VARIATION;
    const r = ok(runSpreadJob(basis, job({ model: none, parts: 500 })));
    const out = new Float64Array(4);
    partXyz(buildPartModel(basis), opticalDepthsOf(basis, TEST_CONCENTRATIONS, TEST_PATH_MM), 0, [0, 0], out);
    const x0 = out[0] / (out[0] + out[1] + out[2]);
    for (const x of r.x) expect(x).toBeCloseTo(x0, 6); // kept as 32-bit floats
    for (const s of r.figures.inSteps) expect([0, 1]).toContain(s.share);
  });

  it('turns shares into the wt % the loading model solves for them when none are given', () => {
    const fractions = beerLambertPhotonBudget(basis, TEST_CONCENTRATIONS, TEST_PATH_MM).opticalFractions;
    const given = ok(runSpreadJob(basis, job()));
    const solved = ok(runSpreadJob(basis, job({ wtPct: null, fractions })));
    solved.wtPct.forEach((w, i) => expect(w).toBeCloseTo(TEST_CONCENTRATIONS[i], 3));
    expect(solved.figures.meanSteps).toBeCloseTo(given.figures.meanSteps, 3);
  });
});
