import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import { uploadSpectrum } from '../../../src/lib/server/library/spectrum-upload';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { materialSpectrumTm27, revisionSpectrumTm27, uploadSpectraTm27 } from '../../../src/lib/server/spectrum-exchange/tm27-export';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { parseSpectrumFile } from '../../../src/lib/spectrum-file/parse';
import { emptyHeader, parseTm27, writeTm27, type Tm27Header } from '../../../src/lib/spectrum-file/tm27';
import { phosphorFields, removeTestMaterials } from '../library/support';
import { approvedRevisionId, completedBatch, countRows, demoUser, partsCsv } from '../measurements/support';
import type { User } from '../../../src/lib/server/accounts/users';

const grid = Array.from({ length: 81 }, (_, i) => 380 + 5 * i);
const band = grid.map((w) => Math.exp(-Math.pow((w - 610) / 45, 2)) + 0.002);
const xmlFile = (xml: string, name = 'spectrum.xml') => ({ name, contentType: 'application/xml', body: Buffer.from(xml, 'utf8') });
const header: Tm27Header = {
  ...emptyHeader(),
  manufacturer: 'Kestrel Hollow Lighting (invented)',
  catalogNumber: 'TST-X1',
  description: 'Nitride red test powder, lot 7',
  documentCreator: 'KH phosphor lab',
  laboratory: 'KH phosphor lab, sphere 1',
  reportNumber: 'PL-2612-001',
  documentCreationDate: '2026-12-05',
  extra: [{ name: 'TestConditions', text: 'excited at 450 nm, 25 °C' }]
};
const distribution = (values: number[]) => ({
  spectralQuantity: 'relative' as const,
  reflectionGeometry: null,
  transmissionGeometry: null,
  bandwidthFwhmNm: 2,
  bandwidthCorrected: true,
  extra: [],
  wavelengths: grid,
  values
});

let formulator: User;
let quality: User;

beforeAll(async () => {
  await removeTestMaterials();
  [formulator, quality] = await Promise.all([demoUser('formulator'), demoUser('quality')]);
});
afterAll(async () => {
  await removeTestMaterials();
  await closeDb();
});

describe('IES TM-27 spectra in and out of the library', () => {
  it('a material spectrum read from a TM-27 file goes out with the same spectrum and header', async () => {
    const id = await editing.create(formulator, 'phosphor', phosphorFields('TST-X1'));
    const xml = writeTm27({ version: '1.0', header, distributions: [distribution(band)] });
    const r = await uploadSpectrum(formulator, id, 'emission', xmlFile(xml), 1);
    expect(r.preview.tm27?.header.laboratory).toBe('KH phosphor lab, sphere 1');
    const out = await materialSpectrumTm27(id, 'emission', 'phosphor');
    const back = parseTm27(out.xml);
    if (!back.ok) throw new Error(JSON.stringify(back.errors));
    expect(back.tm27.header).toEqual(header);
    expect(back.wavelengths).toEqual(grid);
    expect(back.columns[0].values).toEqual(band);
    await expect(materialSpectrumTm27(id, 'emission', 'pump')).rejects.toThrow(/No pump/);
  });

  it('a broken TM-27 file saves nothing and names the element', async () => {
    const id = await editing.create(formulator, 'phosphor', phosphorFields('TST-X2'));
    const before = await countRows('material_spectra');
    const xml = writeTm27({ version: '1.0', header, distributions: [distribution(band)] }).replace(/<Description>.*<\/Description>/, '');
    await expect(uploadSpectrum(formulator, id, 'emission', xmlFile(xml), 1)).rejects.toThrow(/Description element is missing/);
    expect(await countRows('material_spectra')).toBe(before);
  });
});

describe('IES TM-27 spectra of revisions and measurements', () => {
  it("a revision's predicted SPD is exported on the core's grid", async () => {
    const revisionId = await approvedRevisionId();
    const rev = (await getRevision(revisionId))!;
    const back = parseTm27((await revisionSpectrumTm27(rev.formulationId, revisionId)).xml);
    if (!back.ok) throw new Error(JSON.stringify(back.errors));
    expect(back.columns[0].values).toEqual(rev.predicted.spd.values);
    expect(back.wavelengths[0]).toBe(rev.predicted.spd.startNm);
    expect(back.tm27.header.comments).toContain(rev.contentSha256);
    await expect(revisionSpectrumTm27(rev.formulationId + 999_999, revisionId)).rejects.toThrow(/No such revision/);
  });

  it('several spectra in one TM-27 file become several parts, and the upload exports back with its header', async () => {
    const batch = await completedBatch();
    const table = parseSpectrumFile(await partsCsv(batch.revisionId, 3, `T${batch.batchId}`), { multiColumn: true });
    if (!table.ok) throw new Error('synthetic parts did not parse');
    const labHeader = { ...header, catalogNumber: null, description: `Three parts of ${batch.batchNumber}` };
    const xml = writeTm27({
      version: '1.0',
      header: labHeader,
      distributions: table.columns.map((c) => ({ ...distribution(c.values), wavelengths: table.wavelengths }))
    });
    const res = await uploadMeasurements(quality, batch.batchId, xmlFile(xml, 'sphere.xml'));
    expect(res.parts).toBe(3);
    const parts = await db()('part_measurements').where({ upload_id: res.uploadId }).orderBy('column_no');
    expect(parts).toHaveLength(3);
    const back = parseTm27((await uploadSpectraTm27(batch.batchId, res.uploadId)).xml, { multiColumn: true });
    if (!back.ok) throw new Error(JSON.stringify(back.errors));
    expect(back.tm27.header).toEqual(labHeader);
    expect(back.columns.map((c) => c.values)).toEqual(table.columns.map((c) => c.values));
  });
});
