import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  fractionsWithLeak,
  loadingOf,
  materialIdsOf,
  parseRecipe,
  phosphorLines,
  recipeLines,
  type RevisionContent
} from '../../src/lib/recipe';
import { LEGACY_ROW } from './fixtures';

const content = parseRecipe(LEGACY_ROW);
const withWt = (wt: (number | null)[]): RevisionContent => ({
  ...content,
  phosphors: content.phosphors.map((p, i) => ({ ...p, wtPct: wt[i] }))
});

describe('recipe lines (values from tests/recipe/fixtures.ts)', () => {
  it('lists the optical fractions pump leak first, then the phosphors as listed (the mix order)', () => {
    expect(fractionsWithLeak(content)).toEqual([0.15, 0.6, 0.25]);
    expect(phosphorLines(content).map((p) => p.code)).toEqual(['YL-568', 'RD-625']);
    expect(materialIdsOf(content)).toEqual({ pump: 1, phosphors: [3, 4] });
  });

  it('gives the per-phosphor loading only when every phosphor has a positive one', () => {
    expect(loadingOf(content)).toEqual([12, 3]);
    expect(loadingOf(withWt([12, null]))).toBeNull();
    expect(loadingOf(withWt([12, 0]))).toBeNull();
  });

  it('serves every pump bin from the one recipe of version 1 content', () => {
    expect(recipeLines(content, 'B3')).toEqual(recipeLines(content));
    expect(fractionsWithLeak(content, 'B5')).toEqual(fractionsWithLeak(content));
  });
});

describe('round trip: stored text → parseRecipe → stored text', () => {
  const line = fc.record({
    materialId: fc.integer({ min: 1, max: 1e6 }),
    code: fc.string({ minLength: 1, maxLength: 40 }),
    name: fc.string({ minLength: 1, maxLength: 200 }),
    opticalFraction: fc.double({ min: 0, max: 1, noNaN: true }),
    wtPct: fc.option(fc.double({ min: 0, max: 100, noNaN: true }), { nil: null })
  });
  it('reads any valid content to the same lines, with or without the version tag', () => {
    fc.assert(
      fc.property(
        fc.array(line, { minLength: 1, maxLength: 5 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.boolean(),
        (phosphors, leak, tagged) => {
          const { contentVersion: _v, ...untagged } = { ...content, phosphors, pumpLeakFraction: leak };
          const stored = JSON.stringify(tagged ? { contentVersion: 1, ...untagged } : untagged);
          const read = parseRecipe(stored);
          expect(read.contentVersion).toBe(3);
          expect(read.packageModelRef).toBeNull();
          expect(phosphorLines(read)).toEqual(JSON.parse(stored).phosphors);
          expect(fractionsWithLeak(read)).toEqual([
            JSON.parse(stored).pumpLeakFraction,
            ...JSON.parse(stored).phosphors.map((p: { opticalFraction: number }) => p.opticalFraction)
          ]);
          expect(parseRecipe(JSON.stringify(read))).toEqual(read);
        }
      ),
      { numRuns: 200 }
    );
  });
});
