import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { submit } from '../../../src/lib/server/formulations/workflow';
import { addAttachment, attachmentFile, removeAttachment } from '../../../src/lib/server/formulations/attachments';
import { listAttachments } from '../../../src/lib/server/formulations/read';
import { ConflictError, PermissionError, ValidationError } from '../../../src/lib/server/formulations/errors';
import { cast, uniqueCode, warmWhite, type Cast } from './support';

let c: Cast;
const report = { name: 'trial-T1019.csv', body: Buffer.from('wavelength,power\n450,1\n') };

describe('revision attachments', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('the author attaches and removes files on a draft; the bytes come back unchanged', async () => {
    const code = uniqueCode('ATT');
    const d = await createFormulationWithDraft(c.rhea, { code, name: code, content: await warmWhite() });
    const id = await addAttachment(c.rhea, d.revisionId, report, 'Trial build spectra');
    expect((await listAttachments(d.revisionId)).map((a) => a.label)).toEqual(['Trial build spectra']);
    expect((await attachmentFile(d.revisionId, id))!.body.equals(report.body)).toBe(true);
    await expect(addAttachment(c.jonah, d.revisionId, report, 'not mine')).rejects.toBeInstanceOf(PermissionError);
    await expect(addAttachment(c.rhea, d.revisionId, { name: 'run.exe', body: Buffer.from('MZ') }, '')).rejects.toBeInstanceOf(
      ValidationError
    );
    await removeAttachment(c.rhea, d.revisionId, id);
    expect(await listAttachments(d.revisionId)).toEqual([]);
  });

  it('a submitted revision keeps exactly its attachments: the service and the database refuse changes', async () => {
    const code = uniqueCode('ATT');
    const d = await createFormulationWithDraft(c.rhea, { code, name: code, content: await warmWhite() });
    const id = await addAttachment(c.rhea, d.revisionId, report, 'Trial build spectra');
    await submit(c.rhea, d.revisionId);
    await expect(addAttachment(c.rhea, d.revisionId, report, 'late')).rejects.toBeInstanceOf(ConflictError);
    await expect(removeAttachment(c.rhea, d.revisionId, id)).rejects.toBeInstanceOf(ConflictError);
    await expect(db()('revision_attachments').where({ id }).delete()).rejects.toThrow(/locked/);
    const fileId = (await db()('revision_attachments').where({ id }).first())!.stored_file_id;
    await expect(
      db()('revision_attachments').insert({ revision_id: d.revisionId, stored_file_id: fileId, label: 'sneaked in' })
    ).rejects.toThrow(/locked/);
    expect((await listAttachments(d.revisionId)).map((a) => a.id)).toEqual([id]);
  });
});
