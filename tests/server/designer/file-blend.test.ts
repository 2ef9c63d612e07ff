import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { fileBlend } from '../../../src/lib/server/designer/file-blend';
import { filingFormSchema, type FilingForm } from '../../../src/lib/designer/filing';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { ensureDemoMaterials } from '../../support/demo-materials';
import { auditOf, cast, uniqueCode, type Cast } from '../formulations/support';

let ids: Map<string, number>;
let people: Cast;
let siliconeId: number;

/** 3000 K shares of the demo formulation KH-W30-90 rev 2 (seeds/03_formulations.ts, found with the blend solver). */
function form(extra: Record<string, string>): FilingForm {
  const blend = {
    pumpId: ids.get('B-450'),
    phosphorIds: ['GL-530', 'YL-568', 'RD-625'].map((c) => ids.get(c)),
    fractions: [0.07, 0.2667, 0.2346, 0.4287],
    wtPct: [9.32, 7.14, 8.29],
    pathLengthMm: 0.3,
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 90, r9Min: 50 }
  };
  return filingFormSchema.parse({
    notes: 'from the designer',
    siliconeSystemId: String(siliconeId),
    blend: JSON.stringify(blend),
    ...extra
  });
}

describe('filing a designed blend (formulations services, real database)', () => {
  beforeAll(async () => {
    ids = await ensureDemoMaterials(db());
    people = await cast();
    const row = await db()('silicone_systems').first('id');
    // An invented 1:1 system when the demo seed has not run (values invented).
    siliconeId = row
      ? row.id
      : (
          await db()('silicone_systems').insert({
            name: 'Test 1:1 clear encapsulant',
            ratio_a: 1,
            ratio_b: 1,
            pot_life_min: 240,
            cure: '1 h at 80 °C',
            safety_note: 'test'
          })
        )[0];
  });
  afterAll(closeDb);

  it('files a new formulation as draft revision 1 with codes and the silicone system from the database', async () => {
    const code = uniqueCode('DZ');
    const filed = await fileBlend(people.rhea, form({ mode: 'new', name: 'Designer test 3000 K', code }));
    expect(filed.code).toBe(code);
    expect(filed.revisionNo).toBe(1);
    const rev = (await getRevision(filed.revisionId))!;
    expect(rev.state).toBe('draft');
    expect(rev.content.pump.code).toBe('B-450');
    expect(rev.content.phosphors.map((p) => [p.code, p.opticalFraction, p.wtPct])).toEqual([
      ['GL-530', 0.2667, 9.32],
      ['YL-568', 0.2346, 7.14],
      ['RD-625', 0.4287, 8.29]
    ]);
    expect(rev.content.silicone.siliconeSystemId).toBe(siliconeId);
    expect(rev.content.notes).toBe('from the designer');
    // The seed's own prediction of these fractions: 3000 K, Ra ≥ 90, R9 ≈ 50 (seeds/03_formulations.ts log).
    expect(Math.abs(rev.predicted.cct - 3000)).toBeLessThan(15);
    expect((await auditOf('formulation_revision', filed.revisionId)).map((a) => a.action)).toContain('create');
  });

  it('files the next revision of an existing formulation', async () => {
    const first = await fileBlend(people.jonah, form({ mode: 'new', name: 'Designer test revisions', code: uniqueCode('DZ') }));
    const next = await fileBlend(
      people.jonah,
      form({ mode: 'revision', formulationId: String(first.formulationId), basedOnRevisionId: String(first.revisionId) })
    );
    expect(next.formulationId).toBe(first.formulationId);
    expect(next.revisionNo).toBe(2);
    expect((await getRevision(next.revisionId))!.basedOnRevisionId).toBe(first.revisionId);
  });

  it('refuses an unknown silicone system, a pump id that is a phosphor and a technician, saving nothing', async () => {
    const before = Number((await db()('formulations').count({ n: '*' }))[0].n);
    await expect(
      fileBlend(people.rhea, { ...form({ mode: 'new', name: 'x', code: uniqueCode('DZ') }), siliconeSystemId: 999999 })
    ).rejects.toMatchObject({ status: 400, message: 'pick a silicone system from the list' });
    const wrongPump = form({ mode: 'new', name: 'x', code: uniqueCode('DZ') });
    wrongPump.blend.pumpId = ids.get('YL-568')!;
    await expect(fileBlend(people.rhea, wrongPump)).rejects.toMatchObject({ status: 400 });
    await expect(fileBlend(people.tomas, form({ mode: 'new', name: 'x', code: uniqueCode('DZ') }))).rejects.toMatchObject({ status: 403 });
    expect(Number((await db()('formulations').count({ n: '*' }))[0].n)).toBe(before);
  });

  it('refuses a code that is taken (409)', async () => {
    const code = uniqueCode('DZ');
    await fileBlend(people.rhea, form({ mode: 'new', name: 'first', code }));
    await expect(fileBlend(people.rhea, form({ mode: 'new', name: 'second', code }))).rejects.toMatchObject({ status: 409 });
  });
});
