import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../src/lib/blend/basis';
import { correctRecipe } from '../../src/lib/blend/correction';
import { correctBatch } from '../../src/lib/blend/correctBatch';
import { tristimulus } from '../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../src/lib/blend/loading/concentrationsForFractions';
import { colourDistance, resolveTarget } from '../../src/lib/aim/index';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { xyOf } from '../../src/lib/blend/superposition';
import { THREE } from './fixtures';

// Source: measure → correct loop, damped Jacobian step with the model bias carried as an
// offset [common practice].
const target = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const basis = prepareBasis(THREE);
const loading = { pathLengthMm: 0.3 };
const solved = solveBlend({ components: THREE, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' });
const recipeC = concentrationsForFractions(basis.loading!, solved.candidates[0].opticalFractions, loading).concentrationsWtPct;

/** The "real line": the red absorbs 20 % more and the green 10 % less than the model thinks. */
const TRUE_ALPHA = basis.loading!.absorptionPerWtPctMm.map((a, i) => a * [0.9, 1, 1.2][i]);
const build = (c: number[]) =>
  xyOf(tristimulus(beerLambertPhotonBudget({ ...basis.loading!, absorptionPerWtPctMm: TRUE_ALPHA }, c, 0.3).spd));
const err = ([x, y]: [number, number]) => colourDistance(x, y, target).deltaUvPrime;

describe('correction of a biased batch', () => {
  it('loading recipe: the corrected recipe, built on the biased line, lands nearer the target', () => {
    const measured = build(recipeC);
    expect(err(measured)).toBeGreaterThan(0.002);
    const res = correctRecipe(
      basis,
      { kind: 'loading', concentrationsWtPct: recipeC, loading },
      [{ x: measured[0], y: measured[1] }],
      target
    );
    expect(res.converged).toBe(true);
    expect(res.errorAfter.deltaUvPrime).toBeLessThan(1e-6);
    if (res.recipe.kind !== 'loading') throw new Error('kind');
    const rebuilt = build(res.recipe.concentrationsWtPct);
    expect(err(rebuilt)).toBeLessThan(0.25 * err(measured));
  });

  it('iterating build → correct converges on the biased line', () => {
    let c = recipeC;
    let last = err(build(c));
    for (let i = 0; i < 3; i++) {
      const m = build(c);
      const res = correctRecipe(basis, { kind: 'loading', concentrationsWtPct: c, loading }, [{ x: m[0], y: m[1] }], target, {
        stepFraction: 0.8
      });
      if (res.recipe.kind !== 'loading') throw new Error('kind');
      c = res.recipe.concentrationsWtPct;
      const now = err(build(c));
      expect(now).toBeLessThan(last);
      last = now;
    }
    expect(last).toBeLessThan(0.0005);
  });

  it('optical recipe with a constant colour offset is corrected exactly', () => {
    const w = solved.candidates[0].opticalFractions;
    const offset = { x: 0.004, y: -0.003 };
    const res = correctRecipe(basis, { kind: 'optical', fractions: w }, [{ x: target.x + offset.x, y: target.y + offset.y }], target);
    expect(res.bias.dx).toBeCloseTo(offset.x, 6);
    expect(res.bias.dy).toBeCloseTo(offset.y, 6);
    expect(res.errorAfter.deltaUvPrime).toBeLessThan(1e-6);
    if (res.recipe.kind !== 'optical') throw new Error('kind');
    const [x, y] = xyOf(
      tristimulus(
        res.recipe.fractions.reduce((acc, wk, k) => acc.map((v, i) => v + wk * basis.components[k].spd[i]), new Array<number>(471).fill(0))
      )
    );
    expect(Math.hypot(x + offset.x - target.x, y + offset.y - target.y)).toBeLessThan(1e-6);
  });

  it('stepFraction 0.5 moves about half way', () => {
    const m = build(recipeC);
    const res = correctRecipe(basis, { kind: 'loading', concentrationsWtPct: recipeC, loading }, [{ x: m[0], y: m[1] }], target, {
      stepFraction: 0.5
    });
    expect(res.errorAfter.deltaUvPrime).toBeGreaterThan(0.3 * res.errorBefore.deltaUvPrime);
    expect(res.errorAfter.deltaUvPrime).toBeLessThan(0.7 * res.errorBefore.deltaUvPrime);
  });

  it('correctBatch accepts measured x,y points and returns sensitivities', () => {
    const m = build(recipeC);
    const out = correctBatch({
      components: THREE,
      recipe: { kind: 'loading', concentrationsWtPct: recipeC, loading },
      measured: {
        kind: 'xy',
        points: [
          { x: m[0] + 0.001, y: m[1] },
          { x: m[0] - 0.001, y: m[1] }
        ]
      },
      target: { kind: 'ansiBin', nominalCct: 3000 }
    });
    expect(out.measuredMean.x).toBeCloseTo(m[0], 12);
    expect(out.sensitivities).toHaveLength(3);
    expect(out.errorAfter.deltaUvPrime).toBeLessThan(out.errorBefore.deltaUvPrime);
  });
});
