import { describe, expect, it } from 'vitest';
import { filingFormSchema, revisionContentFrom, type DesignedBlend } from '../../../src/lib/designer/filing';
import { revisionContentSchema } from '../../../src/lib/recipe';
import { componentQuerySchema, componentQueryString } from '../../../src/lib/designer/component-query';

const blend: DesignedBlend = {
  pumpId: 1,
  phosphorIds: [3, 4, 5],
  fractions: [0.07, 0.26671, 0.23459, 0.4287],
  wtPct: [9.321, 7.14, 8.2901],
  pathLengthMm: 0.3,
  target: { kind: 'cctDuv', cct: 3000, duv: 0 },
  tolerance: { kind: 'sdcm', steps: 3 },
  floors: { raMin: 90, r9Min: 50 }
};
const refs = {
  pump: { materialId: 1, code: 'B-450', name: 'B-450 royal blue chip' },
  phosphors: [3, 4, 5].map((id) => ({ materialId: id, code: `P-${id}`, name: `P ${id}` }))
};
const silicone = {
  siliconeSystemId: 2,
  name: '1:1 clear',
  ratioA: 1,
  ratioB: 1,
  potLifeMin: 240,
  cure: '1 h at 80 °C',
  densityGPerCm3: 1.08
};

describe('filing a designed blend', () => {
  it('builds revision content the formulations contract accepts, fractions adding up to 1', () => {
    const c = revisionContentFrom(blend, refs, silicone, 'first try');
    expect(revisionContentSchema.safeParse(c).success).toBe(true);
    expect(c.pumpLeakFraction + c.phosphors.reduce((s, p) => s + p.opticalFraction, 0)).toBeCloseTo(1, 12);
    expect(c.phosphors[1]).toMatchObject({ code: 'P-4', opticalFraction: 0.2346, wtPct: 7.14 });
    expect(c.loading).toEqual({ pathLengthMm: 0.3, basis: 'wtPctOfSlurry' });
    expect(c.notes).toBe('first try');
  });

  it('stores no loading basis when wt % were not modelled', () => {
    const c = revisionContentFrom({ ...blend, wtPct: null }, refs, silicone, '');
    expect(c.loading).toBeNull();
    expect(c.phosphors.every((p) => p.wtPct === null)).toBe(true);
  });

  it('parses the form for a new formulation and for a new revision', () => {
    const base = { notes: '', siliconeSystemId: '2', blend: JSON.stringify(blend) };
    const n = filingFormSchema.safeParse({ mode: 'new', name: 'Warm 3000', code: '', ...base });
    expect(n.success && n.data.mode === 'new' && n.data.code).toBe(undefined);
    const r = filingFormSchema.safeParse({ mode: 'revision', formulationId: '7', basedOnRevisionId: '', ...base });
    expect(r.success && r.data.mode === 'revision' && r.data.formulationId).toBe(7);
  });

  it('refuses a missing name, a bad blend and mismatched fractions with readable messages', () => {
    const bad = filingFormSchema.safeParse({ mode: 'new', name: ' ', siliconeSystemId: '', blend: '{not json' });
    expect(bad.success).toBe(false);
    const text = bad.success ? '' : bad.error.issues.map((i) => i.message).join(' | ');
    expect(text).toContain('give the formulation a name');
    expect(text).toContain('pick a silicone system');
    expect(text).toContain('the blend could not be read');
    const short = filingFormSchema.safeParse({
      mode: 'new',
      name: 'x',
      siliconeSystemId: '1',
      blend: JSON.stringify({ ...blend, fractions: [1] })
    });
    expect(short.success ? '' : short.error.issues[0].message).toContain('one fraction per component');
  });
});

describe('component query of the designer', () => {
  it('round-trips pump and phosphor ids', () => {
    const q = new URLSearchParams(componentQueryString(2, [5, 7, 9]));
    expect(componentQuerySchema.parse(Object.fromEntries(q))).toEqual({ pump: 2, phosphors: [5, 7, 9] });
  });

  it('refuses repeats, more than five and junk', () => {
    expect(componentQuerySchema.safeParse({ pump: '1', phosphors: '2,2' }).success).toBe(false);
    expect(componentQuerySchema.safeParse({ pump: '1', phosphors: '1,2,3,4,5,6' }).success).toBe(false);
    expect(componentQuerySchema.safeParse({ pump: 'x', phosphors: '2' }).success).toBe(false);
    expect(componentQuerySchema.safeParse({ phosphors: '2' }).success).toBe(false);
  });

  it('accepts the pump alone', () => {
    expect(componentQuerySchema.parse({ pump: '1' })).toEqual({ pump: 1, phosphors: [] });
  });
});
