/**
 * Thermal data on materials (real MariaDB): replace with an optimistic lock and an audit event, kind
 * checks, CSV upload refused whole with the line named. Curves: a garnet keeping ~92 % and a
 * nitride red ~87 % at 150 °C [from memory]; blue InGaN drift 0.04 nm/K [from memory].
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import { getThermal, putThermal, thermalByMaterialIds, uploadThermalCsv } from '../../../src/lib/server/library/thermal';
import { materialThermalSchema } from '../../../src/lib/blend/thermal';
import { saveThermalForm } from '../../../src/lib/server/library/thermal-form';
import { demoUser, phosphorFields, removeTestMaterials } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

let rhea: User;

const GARNET = materialThermalSchema.parse({
  kind: 'phosphor',
  relativeEmission: [
    { temperatureC: 25, value: 1 },
    { temperatureC: 85, value: 0.98 },
    { temperatureC: 150, value: 0.92 }
  ]
});
const PUMP = materialThermalSchema.parse({
  kind: 'pump',
  peakDriftNmPerK: 0.04,
  relativeOutput: [
    { temperatureC: 25, value: 1 },
    { temperatureC: 150, value: 0.85 }
  ]
});

const auditCount = async (id: number) =>
  Number(
    (
      (await db()('audit_events')
        .where({ entity_type: 'material', entity_id: String(id), action: 'thermal' })
        .count({ n: '*' })
        .first()) as { n: number }
    ).n
  );

describe('material thermal data', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('is "not characterised" until entered, then versioned with an audit event per change', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-T1'));
    expect(await getThermal(id)).toMatchObject({ thermal: null, version: 0 });
    expect(await thermalByMaterialIds([id])).toEqual({});
    expect(await putThermal(rhea, id, 0, GARNET, 'datasheet')).toBe(1);
    expect(await getThermal(id)).toMatchObject({ thermal: GARNET, version: 1, source: 'datasheet' });
    expect(await thermalByMaterialIds([id])).toEqual({ [String(id)]: GARNET });
    expect(await auditCount(id)).toBe(1);
  });

  it('refuses a stale edit (409) and keeps the newer data', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-T2'));
    await putThermal(rhea, id, 0, GARNET, null);
    await expect(putThermal(rhea, id, 0, GARNET, 'second tab')).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/changed by someone else.*version 0.*version 1/)
    });
    expect((await getThermal(id)).source).toBeNull();
    expect(await auditCount(id)).toBe(1);
  });

  it('refuses pump data on a phosphor (422) and saves nothing', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-T3'));
    await expect(putThermal(rhea, id, 0, PUMP, null)).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/is a phosphor/)
    });
    expect(await getThermal(id)).toMatchObject({ thermal: null, version: 0 });
  });

  it('stores a CSV upload, and refuses a CSV with a bad line whole, naming the line', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-T4'));
    const bad = 'temperature_c,relative_emission\n25,1\n85,0.97\n125,-0.2\n';
    await expect(uploadThermalCsv(rhea, id, 'phosphor', 0, { name: 'quench.csv', text: bad })).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/^quench\.csv was not saved: one problem in the file\. Line 4:/),
      issues: [expect.objectContaining({ line: 4 })]
    });
    expect(await getThermal(id)).toMatchObject({ thermal: null, version: 0 });
    expect(await auditCount(id)).toBe(0);
    const good = 'temperature_c,relative_emission\n25,1\n85,0.97\n125,0.93\n';
    expect(await uploadThermalCsv(rhea, id, 'phosphor', 0, { name: 'quench.csv', text: good })).toBe(1);
    const r = await getThermal(id);
    expect(r.source).toBe('quench.csv');
    expect(r.thermal?.kind === 'phosphor' && r.thermal.relativeEmission.map((p) => p.value)).toEqual([1, 0.97, 0.93]);
  });

  it('saves a table typed into the material page form, and names the line of a bad one', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-T5'));
    const form = (csv: string, version = '0') => {
      const fd = new FormData();
      fd.set('csv', csv);
      fd.set('version', version);
      return fd;
    };
    await expect(saveThermalForm(rhea, id, form('temperature_c,relative_emission\n25,1\n85,x'))).rejects.toMatchObject({
      status: 422,
      message: expect.stringMatching(/^The table was not saved: one problem in the file\. Line 3: relative_emission "x" is not a number/)
    });
    expect(await saveThermalForm(rhea, id, form('temperature_c,relative_emission\n25,1\n85,0.97'))).toBe(1);
    await expect(saveThermalForm(rhea, id, form(''))).rejects.toMatchObject({ status: 400 });
  });
});
