/**
 * Property (round trip) with first-order re-absorption and a fixed cavity volume:
 * forward → inverse → forward reproduces random mixes of 1–5 phosphors over 0.05–2 mm.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { basisOf, mixArb } from './roundTripArbitraries';

describe('forward → inverse → forward with re-absorption', () => {
  it('reproduces 2,000 random mixes (cascade path factor 0.5–2)', () => {
    fc.assert(
      fc.property(mixArb, fc.double({ min: 0.5, max: 2, noNaN: true }), ({ ids, c, L }, kappa) => {
        const lb = basisOf(ids).loading!;
        const f = beerLambertPhotonBudget(lb, c, L, true, kappa).opticalFractions;
        const sol = concentrationsForFractions(lb, f, { pathLengthMm: L, cascade: true, cascadePathFactor: kappa });
        expect(sol.converged).toBe(true);
        const back = beerLambertPhotonBudget(lb, sol.concentrationsWtPct, L, true, kappa).opticalFractions;
        back.forEach((v, i) => expect(Math.abs(v - f[i])).toBeLessThan(1e-7));
        if (f[0] > 1e-4) sol.concentrationsWtPct.forEach((v, i) => expect(Math.abs(v - c[i]) / c[i]).toBeLessThan(1e-5));
      }),
      { numRuns: 2_000, seed: 16 }
    );
  }, 180_000);

  it('fixed cavity volume: reproduces 1,500 random mixes', () => {
    const geometry = { geometry: 'fixedVolume' as const, siliconeDensityGPerCm3: 1.1 };
    fc.assert(
      fc.property(mixArb, ({ ids, c, L }) => {
        const lb = basisOf(ids).loading!;
        const f = beerLambertPhotonBudget(lb, c, L, false, 1, geometry).opticalFractions;
        const sol = concentrationsForFractions(lb, f, { pathLengthMm: L, ...geometry });
        expect(sol.converged).toBe(true);
        const back = beerLambertPhotonBudget(lb, sol.concentrationsWtPct, L, false, 1, geometry).opticalFractions;
        back.forEach((v, i) => expect(Math.abs(v - f[i])).toBeLessThan(1e-7));
        if (f[0] > 1e-4) sol.concentrationsWtPct.forEach((v, i) => expect(Math.abs(v - c[i]) / c[i]).toBeLessThan(1e-5));
      }),
      { numRuns: 1_500, seed: 17 }
    );
  }, 180_000);
});
