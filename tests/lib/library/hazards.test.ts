/** Cautions follow the materials that carry the hazard (common practice: the SDS of each material). */
import { describe, expect, it } from 'vitest';
import { hazardList, materialCautions } from '../../../src/lib/library/hazards';
import { materialFieldsSchema } from '../../../src/lib/library/schema';

describe('material hazards', () => {
  it('print the fluoride caution only for the batch that uses a fluoride phosphor, naming it', () => {
    expect(
      materialCautions([
        { code: 'YL-568', hazards: '' },
        { code: 'RD-625', hazards: '' }
      ])
    ).toEqual([]);
    const cautions = materialCautions([
      { code: 'NR-631', hazards: 'hydrogenFluoride' },
      { code: 'YL-568', hazards: '' }
    ]);
    expect(cautions).toHaveLength(1);
    expect(cautions[0]).toMatch(/^NR-631: can release hydrogen fluoride/);
  });

  it('reads stored codes in catalogue order and drops unknown ones', () => {
    expect(hazardList('moistureSensitive, hydrogenFluoride,unknown')).toEqual(['hydrogenFluoride', 'moistureSensitive']);
    expect(hazardList(null)).toEqual([]);
  });

  it('are validated from a form (ticked boxes joined) or a list, and stored sorted', () => {
    const base = { code: 'NR-631', name: 'Line red' };
    expect(materialFieldsSchema.parse({ ...base, hazards: 'moistureSensitive,hydrogenFluoride' }).hazards).toBe(
      'hydrogenFluoride,moistureSensitive'
    );
    expect(materialFieldsSchema.parse({ ...base, hazards: ['hydrogenSulfide'] }).hazards).toBe('hydrogenSulfide');
    expect(materialFieldsSchema.parse(base).hazards).toBe('');
    const bad = materialFieldsSchema.safeParse({ ...base, hazards: 'radioactive' });
    expect(bad.success).toBe(false);
  });
});
