/**
 * The loading-model inverse (wt % for wanted optical fractions) against the Beer–Lambert
 * scaling law: the exponent is α·c·L, so the light depends on c·L alone and the same mix
 * at another path length needs c·L/L′ (Beer 1852; Lambert 1760).
 */
import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { BlendInputError } from '../../../src/lib/blend/errors';
import { beerLambertPhotonBudget, photonBudgetForDepths } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { budgetFractionsForDepths } from '../../../src/lib/blend/loading/budgetFractions';
import {
  LoadingRefusedError,
  concentrationsForFractions,
  requireConcentrations
} from '../../../src/lib/blend/loading/concentrationsForFractions';
import { THREE, blue } from '../fixtures';

const pair = prepareBasis(blue('ph-yl568', 'ph-rd625')).loading!;
const fractionsAt = (c: number[], L: number, cascade = false) => beerLambertPhotonBudget(pair, c, L, cascade).opticalFractions;

describe('inverse scales as 1/L (Beer–Lambert: exponent α·c·L)', () => {
  const cases = [
    // Expected = c·L/L′, hand arithmetic: 15.8·0.3/0.5 = 9.48, 11.5·0.3/0.5 = 6.90; 14·0.5/0.2 = 35, 2.5·0.5/0.2 = 6.25.
    { name: '15.8/11.5 wt % at 0.3 mm asked at 0.5 mm', c: [15.8, 11.5], from: 0.3, to: 0.5, expected: [9.48, 6.9] },
    { name: '14/2.5 wt % at 0.5 mm asked at 0.2 mm', c: [14, 2.5], from: 0.5, to: 0.2, expected: [35, 6.25] }
  ];
  for (const cascade of [false, true]) {
    for (const k of cases) {
      it(`${k.name}${cascade ? ', with re-absorption' : ''}`, () => {
        const sol = concentrationsForFractions(pair, fractionsAt(k.c, k.from, cascade), { pathLengthMm: k.to, cascade });
        expect(sol.converged).toBe(true);
        expect(sol.refusal).toBeNull();
        sol.concentrationsWtPct.forEach((v, i) => expect(v).toBeCloseTo(k.expected[i], 6));
      });
    }
  }

  it('the same optical depths at every path length', () => {
    const f = fractionsAt([10, 3], 0.4);
    const taus = [0.05, 0.3, 2].map((L) => concentrationsForFractions(pair, f, { pathLengthMm: L }).opticalDepths);
    for (const t of taus) t.forEach((v, i) => expect(v).toBeCloseTo(taus[0][i], 9));
  });
});

describe('refusals', () => {
  it('a mix that needs ≥ 100 wt % in total is refused with the path that would do', () => {
    // 30 + 20 wt % at 0.4 mm asked at 0.1 mm → 200 wt % by the 1/L law.
    const f = fractionsAt([30, 20], 0.4);
    const sol = concentrationsForFractions(pair, f, { pathLengthMm: 0.1 });
    expect(sol.converged).toBe(false);
    expect(sol.refusal).toMatch(/200\.0 wt %/);
    expect(sol.refusal).toMatch(/at least 0\.200 mm/);
    expect(() => requireConcentrations(pair, f, { pathLengthMm: 0.1 })).toThrow(LoadingRefusedError);
    expect(new LoadingRefusedError('x')).toBeInstanceOf(BlendInputError);
  });

  it('a mix without pump leak is refused', () => {
    const sol = concentrationsForFractions(pair, [0, 0.6, 0.4], { pathLengthMm: 0.3 });
    expect(sol.converged).toBe(false);
    expect(sol.refusal).toMatch(/no pump leak/);
  });

  it('an unused phosphor gets 0 wt %; pump only gets nothing', () => {
    const sol = concentrationsForFractions(pair, [0.3, 0.7, 0], { pathLengthMm: 0.3 });
    expect(sol.converged).toBe(true);
    expect(sol.concentrationsWtPct[1]).toBe(0);
    expect(concentrationsForFractions(pair, [1, 0, 0], { pathLengthMm: 0.3 }).concentrationsWtPct).toEqual([0, 0]);
  });
});

describe('fraction evaluator of the inverse equals the full photon budget', () => {
  const lb = prepareBasis(THREE).loading!;
  for (const cascade of [false, true]) {
    it(`cascade ${cascade}`, () => {
      for (const tau of [
        [0.1, 0.2, 0.05],
        [1, 3, 2],
        [0, 0.5, 4]
      ]) {
        const fast = budgetFractionsForDepths(lb, tau, cascade, 0.8);
        const full = photonBudgetForDepths(lb, tau, cascade, 0.8).opticalFractions;
        fast.forEach((v, i) => expect(v).toBeCloseTo(full[i], 9));
      }
    });
  }
});
