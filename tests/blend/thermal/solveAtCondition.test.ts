/**
 * Solving for the hot colour point. Checks: the recipe handed over, re-evaluated with the
 * components at the condition, sits on the target within 0.5 MacAdam step (the SDCM of the core,
 * IEC 60081 ellipses); the cold check is the same recipe evaluated at the bench; the bench solve is
 * the plain solve. Target: ANSI C78.377 3000 K quadrangle centre. Thermal data [from memory], see fixtures.
 */
import { describe, expect, it } from 'vitest';
import { colourDistance } from '../../../src/lib/aim';
import { resolveTarget } from '../../../src/lib/aim/target';
import { mix } from '../../../src/lib/blend';
import { requireHotComponents } from '../../../src/lib/blend/thermal';
import { benchRecipeOf, solveAtCondition } from '../../../src/lib/blend/solver/solveAtCondition';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { COMPONENTS, TYPICAL } from './fixtures';

const AT_3000 = { kind: 'ansiBin', nominalCct: 3000 } as const;
const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const target = resolveTarget(AT_3000);

describe('solve at an operating condition', () => {
  for (const loading of [undefined, { pathLengthMm: 0.3 }, { pathLengthMm: 0.3, cascade: true }]) {
    it(`a hot solve re-evaluated hot sits within 0.5 step of the target (${loading ? JSON.stringify(loading) : 'optical'})`, () => {
      const problem = { components: COMPONENTS, target: AT_3000, objective: 'maxLer' as const, loading, condition: HOT, thermal: TYPICAL };
      const res = solveAtCondition(problem);
      expect(res.status).toBe('ok');
      const hot = requireHotComponents(COMPONENTS, TYPICAL, HOT);
      for (const c of res.candidates) {
        const recipe = loading
          ? { kind: 'loading' as const, concentrationsWtPct: c.concentrationsWtPct!, loading }
          : { kind: 'optical' as const, fractions: c.opticalFractions };
        const e = mix(hot.components, recipe).evaluation;
        expect(colourDistance(e.x, e.y, target).steps).toBeLessThan(0.5);
        // The bench build of the same recipe: quenching lost red and yellow light at 85 °C, so the
        // cold point is warmer (lower CCT) than the hot aim, and more than a step away from it.
        const cold = c.coldCheck!;
        expect(cold.cct).toBeLessThan(e.cct);
        expect(cold.steps).toBeGreaterThan(1);
        const bench = mix(COMPONENTS, benchRecipeOf(c, hot.quench, loading)).evaluation;
        expect(cold.x).toBe(bench.x);
        expect(cold.condition.temperatureC).toBe(25);
      }
    });
  }

  it('at the bench the solve is the plain solve and carries no cold check', () => {
    const problem = { components: COMPONENTS, target: AT_3000, objective: 'maxLer' as const, condition: null, thermal: {} };
    const res = solveAtCondition(problem);
    const plain = solveBlend(problem);
    expect(res.candidates.map((c) => c.opticalFractions)).toEqual(plain.candidates.map((c) => c.opticalFractions));
    expect(res.candidates.every((c) => c.coldCheck === null)).toBe(true);
  });

  it('refuses a hot solve on materials that are not characterised, naming them', () => {
    const problem = { components: COMPONENTS, target: AT_3000, objective: 'maxLer' as const, condition: HOT, thermal: {} };
    expect(() => solveAtCondition(problem)).toThrow(/not characterised at Tj 85 °C, 350 mA: B-450 royal blue chip: pump thermal data/);
  });
});
