import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import * as lots from '../../../src/lib/server/library/lots';
import * as attachments from '../../../src/lib/server/library/attachments';
import * as history from '../../../src/lib/server/library/history';
import { getFile } from '../../../src/lib/server/storage/objects';
import { demoUser, phosphorFields, removeTestMaterials } from './support';
import type { User } from '../../../src/lib/server/accounts/users';
import { PDFDocument } from 'pdf-lib';

// A one-page PDF; the library checks the bytes (ISO 32000-1 §7.5.2 header, then the whole document), not the file name.
let pdf: Buffer;
let rhea: User;
let id = 0;

describe('lots and documents of a material', () => {
  beforeAll(async () => {
    const doc = await PDFDocument.create();
    doc.addPage().drawText('Certificate of analysis, lot LLM-7731 (test)');
    pdf = Buffer.from(await doc.save());
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    id = await editing.create(rhea, 'phosphor', phosphorFields('TST-L1'));
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('adds a lot with its certificate of analysis, stored and downloadable', async () => {
    const lotId = await lots.add(
      rhea,
      id,
      { lotNumber: 'LLM-7731', supplier: null, receivedOn: '2026-03-02', expiresOn: '2028-03-02', notes: null },
      { name: 'CoA LLM-7731.pdf', body: pdf }
    );
    const [lot] = await lots.list(id);
    expect(lot).toMatchObject({
      id: lotId,
      lotNumber: 'LLM-7731',
      supplier: 'Larkspur Luminescent Materials',
      receivedOn: '2026-03-02',
      certificateName: 'CoA LLM-7731.pdf'
    });
    expect((await getFile(lot.certificateFileId!))?.body.equals(pdf)).toBe(true);
    expect(await attachments.fileOfMaterial(id, lot.certificateFileId!)).not.toBeNull();
    expect(await attachments.fileOfMaterial(id + 100000, lot.certificateFileId!)).toBeNull();
  });

  it('refuses a duplicate lot number and a certificate that is not a PDF, saving nothing', async () => {
    await expect(
      lots.add(rhea, id, { lotNumber: 'LLM-7731', supplier: null, receivedOn: null, expiresOn: null, notes: null })
    ).rejects.toMatchObject({ status: 409 });
    const files = await db()('stored_files').count({ n: '*' }).first();
    await expect(
      lots.add(
        rhea,
        id,
        { lotNumber: 'LLM-7732', supplier: null, receivedOn: null, expiresOn: null, notes: null },
        { name: 'coa.pdf', body: Buffer.from('not a pdf') }
      )
    ).rejects.toMatchObject({ status: 415, message: expect.stringMatching(/not a PDF/) });
    expect(await db()('material_lots').where({ material_id: id, lot_number: 'LLM-7732' }).first()).toBeUndefined();
    expect((await db()('stored_files').count({ n: '*' }).first())?.n).toBe(files?.n);
  });

  it('refuses files that only start like a PDF (%PDF-<html>, a header alone, a cut-off document), saving nothing', async () => {
    const files = await db()('stored_files').count({ n: '*' }).first();
    const fakes = [
      Buffer.from('%PDF-<html><body><script>alert(1)</script></body></html>', 'latin1'),
      Buffer.from('%PDF-1.7\n', 'latin1'),
      pdf.subarray(0, Math.floor(pdf.length / 2))
    ];
    for (const body of fakes) {
      await expect(attachments.add(rhea, id, 'safety-data-sheet', { name: 'SDS.pdf', body })).rejects.toMatchObject({
        status: 415,
        message: expect.stringMatching(/cannot be read as one.*Nothing was saved/)
      });
      await expect(
        lots.add(
          rhea,
          id,
          { lotNumber: 'LLM-7733', supplier: null, receivedOn: null, expiresOn: null, notes: null },
          { name: 'coa.pdf', body }
        )
      ).rejects.toMatchObject({ status: 415 });
    }
    expect(await db()('material_lots').where({ material_id: id, lot_number: 'LLM-7733' }).first()).toBeUndefined();
    expect((await db()('stored_files').count({ n: '*' }).first())?.n).toBe(files?.n);
  });

  it('adds and removes a safety data sheet, and the history names each step', async () => {
    const fileId = await attachments.add(rhea, id, 'safety-data-sheet', { name: 'SDS TST-L1.pdf', body: pdf });
    expect((await attachments.list(id)).map((d) => d.originalName)).toEqual(['SDS TST-L1.pdf']);
    await attachments.remove(rhea, id, fileId);
    expect(await attachments.list(id)).toEqual([]);
    await expect(attachments.remove(rhea, id, fileId)).rejects.toMatchObject({ status: 404 });
    const actions = (await history.forMaterial(id)).map((h) => h.action);
    expect(actions).toEqual(['Document removed', 'Document added', 'Lot added', 'Created']);
  });

  it('removes a lot with its certificate', async () => {
    const [lot] = await lots.list(id);
    await lots.remove(rhea, id, lot.id);
    expect(await lots.list(id)).toEqual([]);
    expect(await db()('stored_files').where({ id: lot.certificateFileId! }).first()).toBeUndefined();
  });
});
