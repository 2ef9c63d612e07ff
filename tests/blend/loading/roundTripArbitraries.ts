/** Random loading-model mixes for the forward → inverse → forward property tests. */
import fc from 'fast-check';
import { expect } from 'vitest';
import { type Basis, prepareBasis } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { blue } from '../fixtures';

/** Demo phosphors excited by the blue pump (the phosphate blue needs a violet pump). */
export const BLUE_EXCITED = ['ph-cg505', 'ph-gl530', 'ph-gn538', 'ph-yg555', 'ph-yl568', 'ph-or600', 'ph-rd625', 'ph-rd650', 'ph-nr631'];

const bases = new Map<string, Basis>();
export const basisOf = (ids: string[]): Basis => {
  const key = ids.join(',');
  if (!bases.has(key)) bases.set(key, prepareBasis(blue(...ids)));
  return bases.get(key) as Basis;
};

/** 1–5 phosphors, 0.1–18 wt % each (Σ < 90), path 0.05–2 mm. */
export const mixArb = fc
  .record({
    ids: fc.shuffledSubarray(BLUE_EXCITED, { minLength: 1, maxLength: 5 }),
    c: fc.array(fc.double({ min: 0.1, max: 18, noNaN: true }), { minLength: 5, maxLength: 5 }),
    L: fc.double({ min: 0.05, max: 2, noNaN: true })
  })
  .map(({ ids, c, L }) => ({ ids, c: c.slice(0, ids.length), L }));

/** Forward (no re-absorption) → inverse → forward for `numRuns` random mixes; fails on the first miss. */
export function assertRoundTrip(numRuns: number, seed: number): void {
  fc.assert(
    fc.property(mixArb, ({ ids, c, L }) => {
      const lb = basisOf(ids).loading!;
      const f = beerLambertPhotonBudget(lb, c, L).opticalFractions;
      const sol = concentrationsForFractions(lb, f, { pathLengthMm: L });
      expect(sol.converged).toBe(true);
      const back = beerLambertPhotonBudget(lb, sol.concentrationsWtPct, L).opticalFractions;
      back.forEach((v, i) => expect(Math.abs(v - f[i])).toBeLessThan(1e-7));
      // Where the pump leak is measurable the wt % themselves come back.
      if (f[0] > 1e-4) sol.concentrationsWtPct.forEach((v, i) => expect(Math.abs(v - c[i]) / c[i]).toBeLessThan(1e-5));
    }),
    { numRuns, seed }
  );
}
