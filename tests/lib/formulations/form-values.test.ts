import { describe, expect, it } from 'vitest';
import { contentToFormValues, formValuesToRaw } from '../../../src/lib/formulations/form-values';
import { revisionContentSchema, type RevisionContent } from '../../../src/lib/recipe';

const content: RevisionContent = {
  contentVersion: 1,
  pump: { materialId: 11, code: 'B-450', name: 'B-450 royal blue chip' },
  phosphors: [
    { materialId: 12, code: 'GL-530', name: 'GL-530 garnet green', opticalFraction: 0.2667, wtPct: 9.32 },
    { materialId: 13, code: 'NR-631', name: 'NR-631 fluoride line red', opticalFraction: 0.6633, wtPct: null }
  ],
  pumpLeakFraction: 0.07,
  loading: { pathLengthMm: 0.3, basis: 'wtPctOfSlurry' },
  silicone: { siliconeSystemId: 2, name: 'S', ratioA: 10, ratioB: 1, potLifeMin: 90, cure: 'c', densityGPerCm3: 1.03 },
  target: { kind: 'cctDuv', cct: 2700, duv: -0.002 },
  tolerance: { kind: 'sdcm', steps: 2 },
  floors: { raMin: 90, r9Min: 80 },
  notes: 'line red'
};

describe('draft form fields ↔ content', () => {
  it('round-trips every value the form edits (ids; names and silicone details come from the library on save)', () => {
    const raw = revisionContentSchema.parse(formValuesToRaw(contentToFormValues(content)));
    expect(raw.phosphors.map((p) => [p.materialId, p.opticalFraction, p.wtPct])).toEqual([
      [12, 0.2667, 9.32],
      [13, 0.6633, null]
    ]);
    expect(raw).toMatchObject({
      pumpLeakFraction: 0.07,
      loading: content.loading,
      target: content.target,
      tolerance: content.tolerance,
      floors: content.floors,
      notes: 'line red'
    });
    expect(raw.pump.materialId).toBe(11);
    expect(raw.silicone.siliconeSystemId).toBe(2);
  });

  it('reads a decimal comma and leaves empty floors out', () => {
    const v = { ...contentToFormValues(content), leak: '0,07', raMin: '', r9Min: '' };
    const raw = revisionContentSchema.parse(formValuesToRaw(v));
    expect(raw.pumpLeakFraction).toBe(0.07);
    expect(raw.floors).toEqual({});
  });
});

describe('the TM-30 design intent in the draft form', () => {
  it('round-trips and an unknown level is refused by the content schema', () => {
    const withIntent: RevisionContent = { ...content, floors: { raMin: 90, intent: 'P2' } };
    const values = contentToFormValues(withIntent);
    expect(values.intent).toBe('P2');
    expect(revisionContentSchema.parse(formValuesToRaw(values)).floors).toEqual({ raMin: 90, intent: 'P2' });
    expect(revisionContentSchema.safeParse(formValuesToRaw({ ...values, intent: 'P9' })).success).toBe(false);
  });
});
