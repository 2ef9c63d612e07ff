import { describe, expect, it } from 'vitest';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend/demo-components';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { evaluateGrid } from '../../../src/lib/spectral/evaluate';
import { NO_VARIATION, predictYield, variationModelSchema } from '../../../src/lib/blend/spread';

const basis = prepareBasis({ pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) }).loading!;
const common = {
  basis,
  concentrationsWtPct: [3, 6, 2],
  pathLengthMm: 0.3,
  pumpPeakNm: 450,
  centre: { x: 0.4339, y: 0.4033, cct: 3000 },
  quadrangle: null,
  tolerance: null,
  parts: 300,
  seed: 4,
  breakdown: false
};

describe('Ra and R9 on the rendering subsample', () => {
  it('with zero variation every part has the nominal Ra and R9 (CIE 13.3 of the photon-budget spectrum)', () => {
    const none = NO_VARIATION;
    const p = predictYield({ ...common, model: none, renderingSubsample: 20 });
    const cri = evaluateGrid(beerLambertPhotonBudget(basis, [3, 6, 2], 0.3).spd, { tm30: false }).cri!;
    expect(p.rendering!.parts).toBe(20);
    expect(p.rendering!.ra.mean).toBeCloseTo(cri.ra, 9);
    expect(p.rendering!.r9.sd).toBeCloseTo(0, 9);
    expect(p.rendering!.r9.p50).toBeCloseTo(cri.ri[8], 9);
  });

  it('spreads Ra under the default model and keeps the subsample to its size', () => {
    const p = predictYield({ ...common, model: variationModelSchema.parse({}), renderingSubsample: 50 });
    expect(p.rendering!.parts).toBe(50);
    expect(p.rendering!.ra.sd).toBeGreaterThan(0);
    expect(p.cloud.draws).toHaveLength(50);
  });
});

describe('full spectrum of a drawn part', () => {
  it('has the chromaticity the fast path gives for the same draw (CIE 15:2004 eq. 7.1–7.3 on both)', () => {
    const p = predictYield({ ...common, model: variationModelSchema.parse({ peakLotSigmaNm: 2 }), renderingSubsample: 5 });
    const x = p.cloud.x[0];
    const y = p.cloud.y[0];
    const d = p.cloud.draws[0];
    expect(Math.abs(d.pumpShiftNm) + Math.abs(d.peakShiftNm[0])).toBeGreaterThan(0);
    const shift = (v: Float64Array, s: number) =>
      v.map((_, l) =>
        l - s >= 0 && l - s < v.length - 1
          ? v[Math.floor(l - s)] * (1 - (l - s - Math.floor(l - s))) + v[Math.floor(l - s) + 1] * (l - s - Math.floor(l - s))
          : 0
      );
    const shape = (e: Float64Array) => e.map((v, l) => v * (360 + l));
    const shifted = {
      ...basis,
      pump: shift(basis.pump, d.pumpShiftNm),
      emission: basis.emission.map((e, i) => shift(shape(e), d.peakShiftNm[i]).map((v, l) => v / (360 + l)))
    };
    const ev = evaluateGrid(
      beerLambertPhotonBudget(
        shifted,
        [1, 1, 1].map((_, i) => d.opticalDepths[i] / basis.absorptionPerWtPctMm[i] / 0.3),
        0.3
      ).spd,
      { cri: false, tm30: false }
    );
    // The fast path tables the peak shift on a 0.25 nm grid (linear in between): agreement to 1e-4 in x,y.
    expect(ev.x).toBeCloseTo(x, 4);
    expect(ev.y).toBeCloseTo(y, 4);
  });
});
