import { describe, expect, it } from 'vitest';
import { beerLambertPhotonBudget, opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { tristimulusSums } from '../../../src/lib/spectral/colorimetry/tristimulus';
import { xyzToXy } from '../../../src/lib/spectral/colorimetry/chromaticity';
import { uvToCct } from '../../../src/lib/spectral/cct/index';
import { xyToUv } from '../../../src/lib/spectral/colorimetry/chromaticity';
import {
  buildPartModel,
  NO_VARIATION,
  partXyz,
  predictYield,
  simulateSpread,
  variationModelSchema,
  type VariationModel
} from '../../../src/lib/blend/spread';
import { PUMP_PEAK_NM, TEST_CONCENTRATIONS, TEST_PATH_MM, testBasis } from './basis';

const basis = testBasis();
const part = buildPartModel(basis);
const recipe = { opticalDepths: opticalDepthsOf(basis, TEST_CONCENTRATIONS, TEST_PATH_MM), pumpPeakNm: PUMP_PEAK_NM };
const NONE: VariationModel = NO_VARIATION;

function nominalXy(): [number, number] {
  const out = new Float64Array(4);
  partXyz(part, recipe.opticalDepths, 0, [0, 0], out);
  return xyzToXy(out[0], out[1], out[2]);
}

describe('part colour on the loading model', () => {
  it('equals the photon budget (no cascade) folded with the CIE 1931 CMFs at the nominal part', () => {
    // CIE 15:2004 eq. 7.1–7.3: X = Σ S x̄ Δλ on the same 1 nm grid; the fast path must give the same sums.
    const full = beerLambertPhotonBudget(basis, TEST_CONCENTRATIONS, TEST_PATH_MM);
    const [X, Y, Z] = tristimulusSums(full.spd);
    const out = new Float64Array(4);
    partXyz(part, recipe.opticalDepths, 0, [0, 0], out);
    expect(out[0] / X).toBeCloseTo(1, 10);
    expect(out[1] / Y).toBeCloseTo(1, 10);
    expect(out[2] / Z).toBeCloseTo(1, 10);
    expect(out[3] / full.spd.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 10);
  });

  it('a pump shifted by a whole nanometre gives the photon budget of the translated pump', () => {
    // Translation of the pump SPD on the 1 nm grid (exact at whole nm); same Beer–Lambert budget.
    const shifted = { ...basis, pump: new Float64Array(basis.pump.length) };
    for (let l = 0; l + 2 < basis.pump.length; l++) shifted.pump[l + 2] = basis.pump[l];
    const full = beerLambertPhotonBudget(shifted, TEST_CONCENTRATIONS, TEST_PATH_MM);
    const [X, Y, Z] = tristimulusSums(full.spd);
    const out = new Float64Array(4);
    partXyz(part, recipe.opticalDepths, 2, [0, 0], out);
    expect(out[0] / X).toBeCloseTo(1, 10);
    expect(out[1] / Y).toBeCloseTo(1, 10);
    expect(out[2] / Z).toBeCloseTo(1, 10);
  });
});

describe('simulateSpread', () => {
  it('collapses to the nominal point with zero variation, and the yield is 0 or 100 %', () => {
    // With no variation every part is the nominal part (definition of the Monte Carlo).
    const cloud = simulateSpread(part, recipe, NONE, 500, 7);
    const [x0, y0] = nominalXy();
    for (let i = 0; i < cloud.x.length; i++) {
      expect(cloud.x[i]).toBeCloseTo(x0, 12);
      expect(cloud.y[i]).toBeCloseTo(y0, 12);
    }
    const { cct } = uvToCct(...xyToUv(x0, y0));
    const inside = predictYield({
      basis,
      concentrationsWtPct: TEST_CONCENTRATIONS,
      pathLengthMm: TEST_PATH_MM,
      pumpPeakNm: PUMP_PEAK_NM,
      centre: { x: x0 + 0.001, y: y0, cct },
      quadrangle: null,
      tolerance: { kind: 'sdcm', steps: 3 },
      model: NONE,
      parts: 200,
      seed: 1,
      breakdown: false
    });
    for (const r of inside.figures.inSteps) expect([0, 1]).toContain(r.share);
    expect([0, 1]).toContain(inside.figures.inTolerance);
  });

  it('seeded runs are bit-identical, other seeds differ', () => {
    const model = variationModelSchema.parse({ measurementSigmaUvPrime: 0.0005 });
    const a = simulateSpread(part, recipe, model, 2000, 42);
    const b = simulateSpread(part, recipe, model, 2000, 42);
    const c = simulateSpread(part, recipe, model, 2000, 43);
    expect(Buffer.from(a.x.buffer).equals(Buffer.from(b.x.buffer))).toBe(true);
    expect(Buffer.from(a.y.buffer).equals(Buffer.from(b.y.buffer))).toBe(true);
    expect(Buffer.from(a.ler.buffer).equals(Buffer.from(b.ler.buffer))).toBe(true);
    expect(Buffer.from(a.x.buffer).equals(Buffer.from(c.x.buffer))).toBe(false);
  });

  it('draws pump wavelengths from the bins by their share of supply', () => {
    // Sampling by share: a bin with 0 % supply never appears (definition of the draw).
    const model = {
      ...NONE,
      pump: {
        kind: 'bins' as const,
        bins: [
          { code: 'B1', fromNm: 447.5, toNm: 450, sharePct: 100 },
          { code: 'B2', fromNm: 450, toNm: 452.5, sharePct: 0 }
        ]
      }
    };
    const single = { ...NONE, pump: { kind: 'bins' as const, bins: [{ code: 'B1', fromNm: 447.5, toNm: 450, sharePct: null }] } };
    const a = simulateSpread(part, recipe, model, 300, 3);
    const b = simulateSpread(part, recipe, single, 300, 3);
    expect(Array.from(a.x)).toEqual(Array.from(b.x));
    const other = simulateSpread(
      part,
      recipe,
      {
        ...model,
        pump: {
          ...model.pump,
          bins: [
            { ...model.pump.bins[0], sharePct: 0 },
            { ...model.pump.bins[1], sharePct: 100 }
          ]
        }
      },
      300,
      3
    );
    expect(Array.from(other.x)).not.toEqual(Array.from(a.x));
  });
});
