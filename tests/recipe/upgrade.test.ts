import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
  CONTENT_VERSION,
  RECIPE_VERSIONS,
  RecipeContentError,
  checkRecipe,
  createRecipeReader,
  fractionsWithLeak,
  parseRecipe,
  safeParseRecipe,
  revisionContentV3ObjectSchema,
  checkBinRecipes,
  type ContentVersion,
  type RevisionContentV3
} from '../../src/lib/recipe';
import { compareRatios, compareSettings } from '../../src/lib/formulations/compare';
import { weighoutInputFromRevision } from '../../src/lib/batches/weighout/from-revision';
import { computeWeighout } from '../../src/lib/batches/weighout/compute';
import { LEGACY_ROW, V1_ROW } from './fixtures';

// A version 4 that exists only in this test: it adds the package outline the recipe was built in.
const contentV4Schema = revisionContentV3ObjectSchema
  .extend({
    contentVersion: z.literal(4),
    outline: z.object({ lengthMm: z.number(), widthMm: z.number() }).nullable()
  })
  .superRefine(checkBinRecipes);
type RevisionContentV4 = z.output<typeof contentV4Schema>;
const v4: ContentVersion<RevisionContentV4> = {
  version: 4,
  schema: contentV4Schema,
  upgrade: (previous: RevisionContentV3) => ({ ...previous, contentVersion: 4, outline: null })
};
const readV4 = createRecipeReader([...RECIPE_VERSIONS, v4]);

const weighRequest = {
  sizing: { kind: 'mass' as const, batchMassG: 20 },
  loading: { mode: 'perPhosphor' as const, basis: 'wtPctOfSlurry' as const },
  additives: [],
  balance: { resolutionG: 0.001, minWeightG: 0.05 }
};

describe('stored content of version 1 and before the tag, read by the product', () => {
  it('reads a row without contentVersion as version 1, upgrades it, and leaves the stored text alone', () => {
    const before = LEGACY_ROW;
    const c = parseRecipe(LEGACY_ROW);
    expect(c.contentVersion).toBe(3);
    expect(c.packageModelRef).toBeNull();
    expect(c).toMatchObject({ condition: null, coldCheck: null, binRecipes: [] });
    expect(safeParseRecipe(LEGACY_ROW)).toMatchObject({ ok: true, storedVersion: 1 });
    expect(c.pumpLeakFraction).toBe(0.15);
    expect(LEGACY_ROW).toBe(before);
    expect(JSON.parse(LEGACY_ROW)).not.toHaveProperty('contentVersion');
  });

  it('does not touch a parsed value handed to it', () => {
    const raw = JSON.parse(LEGACY_ROW);
    parseRecipe(raw);
    expect(raw).not.toHaveProperty('contentVersion');
  });

  it('writes new content as version 3; a version 2 row cites a package model or none', () => {
    expect(CONTENT_VERSION).toBe(3);
    expect(parseRecipe(V1_ROW).contentVersion).toBe(3);
    const stored = JSON.stringify({ ...JSON.parse(V1_ROW), contentVersion: 2, packageModelRef: { id: 4, version: 2 } });
    expect(safeParseRecipe(stored)).toMatchObject({ ok: true, storedVersion: 2, content: { packageModelRef: { id: 4, version: 2 } } });
    const { packageModelRef: _p, ...withoutRef } = JSON.parse(stored);
    expect(parseRecipe(withoutRef).packageModelRef).toBeNull();
  });

  it('refuses a package model reference that is not an id and a version', () => {
    const base = { ...JSON.parse(V1_ROW), contentVersion: 2 };
    expect(() => parseRecipe({ ...base, packageModelRef: 'PKG-2835-A' })).toThrow(/packageModelRef/);
    expect(() => parseRecipe({ ...base, packageModelRef: { id: 4 } })).toThrow(/packageModelRef\.version/);
    expect(() => parseRecipe({ ...base, packageModelRef: { id: 4, version: 0 } })).toThrow(/packageModelRef\.version/);
  });
});

describe('after a (test-only) version 4 adds a field', () => {
  const legacy = readV4.parse(LEGACY_ROW);
  const v1 = readV4.parse(V1_ROW);

  it('reads both older rows through the upgraders', () => {
    expect(legacy).toMatchObject({ contentVersion: 4, outline: null, condition: null, packageModelRef: null, pumpLeakFraction: 0.15 });
    expect(v1).toMatchObject({ contentVersion: 4, outline: null, condition: null, packageModelRef: null, pumpLeakFraction: 0.13 });
    const { contentVersion: _a, outline: _b, ...rest } = v1;
    const { contentVersion: _c, ...asV2 } = parseRecipe(V1_ROW);
    expect(rest).toEqual(asV2);
  });

  it('reads version 4 content as it is, and the version 3 product refuses it by name', () => {
    const outline = { lengthMm: 2.8, widthMm: 3.5 };
    const stored = JSON.stringify({ ...JSON.parse(V1_ROW), contentVersion: 4, packageModelRef: null, outline });
    expect(readV4.parse(stored).outline).toEqual(outline);
    expect(() => parseRecipe(stored)).toThrow(/contentVersion: version 4 is newer than this software reads \(up to 3\)/);
  });

  it('compares them: Δ = B − A on the lines of the recipe (hand-worked from the fixtures)', () => {
    const rows = compareRatios(legacy, v1);
    // Leak 0.15 → 0.13, YL-568 0.60 → 0.60, RD-625 0.25 → 0.27.
    expect(rows.map((r) => r.code)).toEqual(['B-450 leak', 'YL-568', 'RD-625']);
    expect(rows[0].b!.opticalFraction - rows[0].a!.opticalFraction).toBeCloseTo(-0.02, 12);
    expect(rows[1]).toMatchObject({ changed: false });
    expect(rows[2]).toMatchObject({ changed: true });
    expect(rows[2].deltaOptical).toBeCloseTo(0.02, 12);
    const settings = compareSettings(legacy, v1)
      .filter((r) => r.changed)
      .map((r) => r.label);
    expect(settings).toEqual(['Tolerance', 'Notes']);
  });

  it('weighs the upgraded legacy row: 20.000 g at 12 + 3 wt % of slurry on a 1:1 silicone', () => {
    // YL 20 × 12 % = 2.400 g; RD 20 × 3 % = 0.600 g; silicone 20 − 3 = 17.000 g → A = B = 8.500 g
    // (worked by hand, as in tests/lib/batches/weighout/compute.test.ts).
    const built = weighoutInputFromRevision(legacy, weighRequest);
    if (!built.ok) throw new Error(built.errors.map((e) => e.message).join('; '));
    const result = computeWeighout(built.input);
    if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('; '));
    expect(result.plan.lines.map((l) => [l.code, l.targetG])).toEqual([
      ['PART A', '8.500'],
      ['YL-568', '2.400'],
      ['RD-625', '0.600'],
      ['PART B', '8.500']
    ]);
  });

  it('gives the mix the same fractions, pump leak first (they add up to 1: optical superposition)', () => {
    expect(fractionsWithLeak(legacy)).toEqual([0.15, 0.6, 0.25]);
    expect(fractionsWithLeak(v1).reduce((a, f) => a + f, 0)).toBeCloseTo(1, 12);
  });

  it('checks what an upgrader produces, naming the step', () => {
    const broken: ContentVersion<RevisionContentV4> = { ...v4, upgrade: (p: RevisionContentV3) => ({ ...p, contentVersion: 4 }) };
    const read = createRecipeReader([...RECIPE_VERSIONS, broken]);
    expect(() => read.parse(LEGACY_ROW)).toThrow(/upgraded from version 1 to 4 is invalid: outline/);
  });

  it('refuses a chain with a gap or a missing upgrader', () => {
    expect(() => createRecipeReader([...RECIPE_VERSIONS, { ...v4, version: 5 }])).toThrow(/version 5 does not follow 3/);
    expect(() => createRecipeReader([...RECIPE_VERSIONS, { version: 4, schema: contentV4Schema }])).toThrow(/no upgrader from 3/);
  });
});

describe('content that cannot be read gets an error naming what is wrong', () => {
  const cases: { name: string; input: unknown; message: RegExp }[] = [
    { name: 'not JSON', input: '{"pump":', message: /not valid JSON/ },
    { name: 'not an object', input: '[1,2]', message: /\(content\): expected a JSON object/ },
    {
      name: 'a tag that is not a version',
      input: { ...JSON.parse(V1_ROW), contentVersion: '1' },
      message: /contentVersion: "1" is not a known version/
    },
    { name: 'a missing pump', input: { ...JSON.parse(V1_ROW), pump: undefined }, message: /version 1\) is invalid: pump: / },
    {
      name: 'a fraction above 1',
      input: JSON.stringify({ ...JSON.parse(LEGACY_ROW), pumpLeakFraction: 1.5 }),
      message: /pumpLeakFraction: /
    }
  ];
  it.each(cases)('$name', ({ input, message }) => {
    expect(() => parseRecipe(input)).toThrow(RecipeContentError);
    expect(() => parseRecipe(input)).toThrow(message);
  });
});

describe('content sent in a request', () => {
  it('is checked as a value: JSON text is not taken for content there', () => {
    expect(checkRecipe(JSON.parse(V1_ROW)).ok).toBe(true);
    expect(checkRecipe(V1_ROW)).toMatchObject({ ok: false, issues: [{ path: '(content)', message: 'expected a JSON object' }] });
  });
});
