/**
 * Filing a hot-aimed blend: the revision content (version 3) stores the operating condition and
 * the cold check point, and reads them back through the recipe reader. Values invented; the 85 °C
 * junction condition is common practice for hot binning.
 */
import { describe, expect, it } from 'vitest';
import { filingFormSchema, revisionContentFrom, type DesignedBlend } from '../../../src/lib/designer/filing';
import { parseRecipe } from '../../../src/lib/recipe';

const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const COLD = {
  x: 0.4372,
  y: 0.4021,
  cct: 2990,
  duv: 0.0006,
  ra: 82,
  r9: 10,
  steps: 2.2,
  condition: { reference: 'junction' as const, temperatureC: 25, driveCurrentMa: null }
};

const blend: DesignedBlend = {
  pumpId: 1,
  phosphorIds: [2, 3],
  fractions: [0.2, 0.6, 0.2],
  wtPct: [9, 1.6],
  pathLengthMm: 0.3,
  target: { kind: 'ansiBin', nominalCct: 3000 },
  tolerance: { kind: 'sdcm', steps: 3 },
  floors: {},
  condition: HOT,
  coldCheck: COLD
};
const refs = {
  pump: { materialId: 1, code: 'B-450', name: 'B-450' },
  phosphors: [2, 3].map((id) => ({ materialId: id, code: `P-${id}`, name: `P ${id}` }))
};
const silicone = { siliconeSystemId: 2, name: '1:1 clear', ratioA: 1, ratioB: 1, potLifeMin: 240, cure: '', densityGPerCm3: 1.08 };
const form = (b: unknown) =>
  filingFormSchema.safeParse({ mode: 'new', name: 'Hot', notes: '', siliconeSystemId: '2', blend: JSON.stringify(b) });

describe('filing a hot-aimed blend', () => {
  it('stores the condition and the cold check in the revision content', () => {
    const parsed = form(blend);
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    const c = parseRecipe(JSON.parse(JSON.stringify(revisionContentFrom(parsed.data.blend, refs, silicone, ''))));
    expect(c.condition).toEqual(HOT);
    expect(c.coldCheck).toEqual(COLD);
  });

  it('files a bench blend with neither, and refuses a cold check without a condition', () => {
    const { condition: _c, coldCheck: _k, ...bench } = blend;
    const parsed = form(bench);
    expect(parsed.success && revisionContentFrom(parsed.data.blend, refs, silicone, '')).toMatchObject({
      condition: null,
      coldCheck: null
    });
    expect(form({ ...blend, condition: null }).success).toBe(false);
  });
});
