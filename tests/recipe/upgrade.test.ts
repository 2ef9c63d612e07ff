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
  revisionContentV1Schema,
  type ContentVersion,
  type RevisionContentV1
} from '../../src/lib/recipe';
import { compareRatios, compareSettings } from '../../src/lib/formulations/compare';
import { weighoutInputFromRevision } from '../../src/lib/batches/weighout/from-revision';
import { computeWeighout } from '../../src/lib/batches/weighout/compute';
import { LEGACY_ROW, V1_ROW } from './fixtures';

// A version 2 that exists only in this test: it adds the package model the recipe was designed for.
const contentV2Schema = revisionContentV1Schema.extend({
  contentVersion: z.literal(2),
  packageModelRef: z.string().min(1).nullable()
});
type RevisionContentV2 = z.output<typeof contentV2Schema>;
const v2: ContentVersion<RevisionContentV2> = {
  version: 2,
  schema: contentV2Schema,
  upgrade: (previous: RevisionContentV1) => ({ ...previous, contentVersion: 2, packageModelRef: null })
};
const readV2 = createRecipeReader([...RECIPE_VERSIONS, v2]);

const weighRequest = {
  sizing: { kind: 'mass' as const, batchMassG: 20 },
  loading: { mode: 'perPhosphor' as const, basis: 'wtPctOfSlurry' as const },
  additives: [],
  balance: { resolutionG: 0.001, minWeightG: 0.05 }
};

describe('stored content of version 1 and before the tag, read by the product', () => {
  it('reads a row without contentVersion as version 1 and leaves the stored text alone', () => {
    const before = LEGACY_ROW;
    const c = parseRecipe(LEGACY_ROW);
    expect(c.contentVersion).toBe(1);
    expect(c.pumpLeakFraction).toBe(0.15);
    expect(LEGACY_ROW).toBe(before);
    expect(JSON.parse(LEGACY_ROW)).not.toHaveProperty('contentVersion');
  });

  it('does not touch a parsed value handed to it', () => {
    const raw = JSON.parse(LEGACY_ROW);
    parseRecipe(raw);
    expect(raw).not.toHaveProperty('contentVersion');
  });

  it('writes new content as the current version', () => {
    expect(CONTENT_VERSION).toBe(1);
    expect(parseRecipe(V1_ROW).contentVersion).toBe(1);
  });
});

describe('after a (test-only) version 2 adds a field', () => {
  const legacy = readV2.parse(LEGACY_ROW);
  const v1 = readV2.parse(V1_ROW);

  it('reads both older rows through the upgrader', () => {
    expect(legacy).toMatchObject({ contentVersion: 2, packageModelRef: null, pumpLeakFraction: 0.15 });
    expect(v1).toMatchObject({ contentVersion: 2, packageModelRef: null, pumpLeakFraction: 0.13 });
    const { contentVersion: _a, packageModelRef: _b, ...rest } = v1;
    const { contentVersion: _c, ...asV1 } = parseRecipe(V1_ROW);
    expect(rest).toEqual(asV1);
  });

  it('reads version 2 content as it is, and the version 1 product refuses it by name', () => {
    const stored = JSON.stringify({ ...JSON.parse(V1_ROW), contentVersion: 2, packageModelRef: 'PKG-2835-A' });
    expect(readV2.parse(stored).packageModelRef).toBe('PKG-2835-A');
    expect(() => parseRecipe(stored)).toThrow(/contentVersion: version 2 is newer than this software reads \(up to 1\)/);
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
    const broken: ContentVersion<RevisionContentV2> = { ...v2, upgrade: (p: RevisionContentV1) => ({ ...p, contentVersion: 2 }) };
    const read = createRecipeReader([...RECIPE_VERSIONS, broken]);
    expect(() => read.parse(LEGACY_ROW)).toThrow(/upgraded from version 1 to 2 is invalid: packageModelRef/);
  });

  it('refuses a chain with a gap or a missing upgrader', () => {
    expect(() => createRecipeReader([...RECIPE_VERSIONS, { ...v2, version: 3 }])).toThrow(/version 3 does not follow 1/);
    expect(() => createRecipeReader([...RECIPE_VERSIONS, { version: 2, schema: contentV2Schema }])).toThrow(/no upgrader from 1/);
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
