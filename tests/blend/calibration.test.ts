import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../src/lib/blend/basis';
import { calibrateAbsorption } from '../../src/lib/blend/calibration/calibrateAbsorption';
import { beerLambertPhotonBudget } from '../../src/lib/blend/loading/beerLambertPhotonBudget';
import { THREE } from './fixtures';

// Synthetic builds from known absorption coefficients; the fit starts from wrong values.
// Source: Levenberg (1944) / Marquardt (1963) least squares recovers the generating
// parameters of noiseless data exactly and of noisy data within a few standard errors
// [common practice for fit validation].
const basis = prepareBasis(THREE);
const lb = basis.loading!;
const L = 0.3;
const TRUE_ALPHA = [0.28, 0.41, 0.55];
const RECIPES = [
  [3, 6, 2],
  [5, 4, 3],
  [2, 9, 1.5]
];

function builds(cascade: boolean, noise: number, seed = 7) {
  let s = seed;
  const rnd = () => (s = (s * 16807) % 2147483647) / 2147483647;
  const gauss = () => Math.sqrt(-2 * Math.log(rnd())) * Math.cos(2 * Math.PI * rnd());
  return RECIPES.map((c) => {
    const spd = beerLambertPhotonBudget({ ...lb, absorptionPerWtPctMm: TRUE_ALPHA }, c, L, cascade).spd;
    let peak = 0;
    for (const v of spd) peak = Math.max(peak, v);
    return { concentrationsWtPct: c, measured: spd.map((v) => Math.max(0, v + noise * peak * gauss())) };
  });
}

describe('calibration of α from measured builds', () => {
  for (const cascade of [false, true]) {
    it(`noiseless, cascade ${cascade}: recovers α to 1e-4 relative`, () => {
      const rep = calibrateAbsorption(lb, builds(cascade, 0), { pathLengthMm: L, cascade, initialAlpha: [0.1, 0.1, 0.1] });
      rep.absorptionPerWtPctMm.forEach((a, i) => expect(Math.abs(a / TRUE_ALPHA[i] - 1)).toBeLessThan(1e-4));
      rep.alphaLProducts.forEach((p, i) => expect(p).toBeCloseTo(TRUE_ALPHA[i] * L, 6));
      rep.builds.forEach((b) => expect(b.relativeRms).toBeLessThan(1e-5));
    });
  }

  it('1 % of peak Gaussian noise: recovers α within 5 % and reports residuals at the noise level', () => {
    const rep = calibrateAbsorption(lb, builds(false, 0.01), { pathLengthMm: L, initialAlpha: [0.1, 0.1, 0.1] });
    rep.absorptionPerWtPctMm.forEach((a, i) => expect(Math.abs(a / TRUE_ALPHA[i] - 1)).toBeLessThan(0.05));
    rep.standardErrors.forEach((se) => expect(se).toBeGreaterThan(0));
    rep.builds.forEach((b) => {
      expect(b.relativeRms).toBeGreaterThan(0.003);
      expect(b.relativeRms).toBeLessThan(0.03);
    });
  });

  it('only α·L is identifiable: doubling L halves the fitted α', () => {
    const data = builds(false, 0);
    const a = calibrateAbsorption(lb, data, { pathLengthMm: L, initialAlpha: [0.1, 0.1, 0.1] });
    const b = calibrateAbsorption(lb, data, { pathLengthMm: 2 * L, initialAlpha: [0.1, 0.1, 0.1] });
    a.alphaLProducts.forEach((p, i) => expect(b.alphaLProducts[i]).toBeCloseTo(p, 6));
  });
});
