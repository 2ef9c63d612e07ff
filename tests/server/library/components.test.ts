import { afterAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { listMaterialOptions, loadBlendComponents } from '../../../src/lib/server/library/components';
import { mix, DEMO_PHOSPHORS } from '../../../src/lib/blend';

const idOf = async (code: string) => Number((await db()('materials').where({ code }).first('id'))!.id);

describe('library materials as blend components (seeded demo library)', () => {
  afterAll(closeDb);

  it('lists the seeded phosphors and pumps with code, family and peak', async () => {
    const phosphors = await listMaterialOptions('phosphor');
    expect(phosphors.map((p) => p.code)).toEqual(expect.arrayContaining(['CG-505', 'GL-530', 'YL-568', 'RD-625', 'NR-631']));
    expect(phosphors.length).toBeGreaterThanOrEqual(DEMO_PHOSPHORS.length);
    const yl = phosphors.find((p) => p.code === 'YL-568')!;
    expect(yl.family).toBe('garnet (Y,Gd), Ce-activated');
    expect(yl.peakNm).toBeCloseTo(568, 0); // nominal peak of the demo garnet (DEMO_PHOSPHORS, from memory)
    expect((await listMaterialOptions('pump')).map((p) => p.code)).toEqual(['V-405', 'B-450']); // ordered by peak
  });

  it('loads a pump and phosphors as specs the blend model accepts, ids as strings of material ids', async () => {
    const [b450, yl, rd] = [await idOf('B-450'), await idOf('YL-568'), await idOf('RD-625')];
    const c = await loadBlendComponents(b450, [yl, rd]);
    expect(c.pump.id).toBe(String(b450));
    expect(c.phosphors.map((p) => p.id)).toEqual([String(yl), String(rd)]);
    expect(c.phosphors[0]).toMatchObject({ iqe: 0.93, densityGPerCm3: 4.8, costPerKg: 140, absorptionReferenceNm: 450 });
    expect(c.phosphors[0].excitation?.wavelengths.length).toBe(471);
    const r = mix(c, { kind: 'optical', fractions: [0.2, 0.6, 0.2] });
    expect(r.evaluation.cct).toBeGreaterThan(2000);
  });

  it('refuses a phosphor id in the pump slot and an unknown id', async () => {
    const yl = await idOf('YL-568');
    await expect(loadBlendComponents(yl, [yl])).rejects.toMatchObject({ status: 422, message: 'YL-568 is a phosphor, not a pump.' });
    await expect(loadBlendComponents(999999, [yl])).rejects.toMatchObject({ status: 404 });
  });
});
