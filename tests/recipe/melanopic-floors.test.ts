import { describe, expect, it } from 'vitest';
import { parseRecipe } from '../../src/lib/recipe';
import { floorsText } from '../../src/lib/formulations/compare';
import { contentToFormValues, formValuesToRaw } from '../../src/lib/formulations/form-values';
import { LEGACY_ROW, V1_ROW } from './fixtures';

// The melanopic DER floor and ceiling (CIE S 026/E:2018) are optional fields of the current content's
// floors: older rows read as before, new rows keep them [common practice: additive schema change].
describe('melanopic DER limits in the revision content', () => {
  it('reads older rows unchanged (no melanopic limits)', () => {
    for (const row of [LEGACY_ROW, V1_ROW]) {
      const c = parseRecipe(JSON.parse(row));
      expect(c.floors).toEqual({ raMin: 90 });
      expect(floorsText(c)).toBe('Ra ≥ 90');
    }
  });

  it('keeps a floor and a ceiling, shows them, and carries them through the revision form', () => {
    const stored = { ...JSON.parse(V1_ROW), floors: { raMin: 80, melDerMin: 0.3, melDerMax: 0.45 } };
    const c = parseRecipe(stored);
    expect(c.floors).toEqual({ raMin: 80, melDerMin: 0.3, melDerMax: 0.45 });
    expect(floorsText(c)).toBe('Ra ≥ 80, melanopic DER ≥ 0.3, melanopic DER ≤ 0.45');
    const v = contentToFormValues(c);
    expect([v.melDerMin, v.melDerMax]).toEqual(['0.3', '0.45']);
    expect((formValuesToRaw(v) as { floors: object }).floors).toEqual({ raMin: 80, melDerMin: 0.3, melDerMax: 0.45 });
  });

  it('refuses a floor above the ceiling by name', () => {
    const stored = { ...JSON.parse(V1_ROW), floors: { melDerMin: 0.6, melDerMax: 0.45 } };
    expect(() => parseRecipe(stored)).toThrow(/melanopic DER floor must not exceed its ceiling/);
  });
});
