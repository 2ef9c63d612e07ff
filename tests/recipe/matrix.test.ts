/**
 * Version 3 content: the recipe matrix (one recipe per pump wavelength bin), the operating condition
 * of the target and the cold check point. Values invented; bins 2.5 nm wide (common practice).
 */
import { describe, expect, it } from 'vitest';
import {
  UnknownPumpBinError,
  binCodesOf,
  fractionsWithLeak,
  hasRecipeMatrix,
  loadingOf,
  parseRecipe,
  recipeLines,
  safeParseRecipe
} from '../../src/lib/recipe';
import { V1_ROW } from './fixtures';

const v1 = JSON.parse(V1_ROW);
const bin = (code: string, fromNm: number) => ({ code, basis: 'peak', fromNm, toNm: fromNm + 2.5, sharePct: null });
const binRecipe = (code: string, fromNm: number, leak: number, yl: number, rd: number) => ({
  bin: bin(code, fromNm),
  pumpLeakFraction: leak,
  phosphors: [
    { ...v1.phosphors[0], opticalFraction: yl, wtPct: 11 + fromNm / 1000 },
    { ...v1.phosphors[1], opticalFraction: rd, wtPct: 3 }
  ],
  predicted: { x: 0.4338, y: 0.403, cct: 3000, duv: 0, ra: 82, r9: 10, steps: 0.2 }
});
const v3 = {
  ...v1,
  contentVersion: 3,
  packageModelRef: null,
  condition: { reference: 'junction', temperatureC: 85, driveCurrentMa: 350 },
  coldCheck: { x: 0.432, y: 0.401, cct: 3040, duv: -0.0005, condition: { temperatureC: 25 } },
  binRecipes: [binRecipe('B4', 447.5, 0.14, 0.6, 0.26), binRecipe('B5', 450, 0.13, 0.6, 0.27)]
};

describe('recipe matrix (version 3)', () => {
  const content = parseRecipe(JSON.stringify(v3));

  it('reads the matrix, the condition and the cold check target', () => {
    expect(content.contentVersion).toBe(3);
    expect(hasRecipeMatrix(content)).toBe(true);
    expect(binCodesOf(content)).toEqual(['B4', 'B5']);
    expect(content.condition).toEqual({ reference: 'junction', temperatureC: 85, driveCurrentMa: 350 });
    expect(content.coldCheck?.condition).toEqual({ reference: 'junction', temperatureC: 25, driveCurrentMa: null });
  });

  it("gives a bin's own recipe for its key (without case), and the nominal recipe without a key", () => {
    expect(fractionsWithLeak(content, 'B4')).toEqual([0.14, 0.6, 0.26]);
    expect(fractionsWithLeak(content, 'b5')).toEqual([0.13, 0.6, 0.27]);
    expect(fractionsWithLeak(content)).toEqual([0.13, 0.6, 0.27]);
    expect(loadingOf(content, 'B4')).toEqual([11.4475, 3]);
    expect(recipeLines(content, 'B4').pump).toEqual(content.pump);
  });

  it('refuses a bin the matrix holds no recipe for, naming the bins it has', () => {
    expect(() => recipeLines(content, 'B6')).toThrow(UnknownPumpBinError);
    expect(() => recipeLines(content, 'B6')).toThrow('this revision has no recipe for pump bin B6 (its recipes are for B4, B5)');
  });

  it('refuses a bin recipe with other phosphors than the nominal one, or two recipes for one bin', () => {
    const swapped = { ...v3, binRecipes: [{ ...v3.binRecipes[0], phosphors: [...v3.binRecipes[0].phosphors].reverse() }] };
    expect(safeParseRecipe(swapped)).toMatchObject({ ok: false, issues: [{ path: 'binRecipes.0.phosphors' }] });
    const twice = { ...v3, binRecipes: [v3.binRecipes[0], { ...v3.binRecipes[1], bin: bin('b4', 450) }] };
    expect(safeParseRecipe(twice)).toMatchObject({
      ok: false,
      issues: [{ path: 'binRecipes.1.bin.code', message: 'bin b4 has two recipes' }]
    });
  });

  it('refuses a condition outside −40 to 200 °C', () => {
    const hot = { ...v3, condition: { ...v3.condition, temperatureC: 260 } };
    expect(safeParseRecipe(hot)).toMatchObject({ ok: false, issues: [{ path: 'condition.temperatureC' }] });
  });

  it('upgrades a version 2 row to the bench condition with one recipe for every bin', () => {
    const v2 = parseRecipe(JSON.stringify({ ...v1, contentVersion: 2, packageModelRef: null }));
    expect(v2).toMatchObject({ contentVersion: 3, condition: null, coldCheck: null, binRecipes: [] });
    expect(fractionsWithLeak(v2, 'B9')).toEqual(fractionsWithLeak(v2));
  });
});
