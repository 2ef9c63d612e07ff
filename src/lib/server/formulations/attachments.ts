/**
 * Files attached to a draft revision (data sheets, trial reports, measured spectra). Only the
 * draft's author adds or removes them; once the revision leaves draft the database refuses any
 * change (trigger), so a signed revision keeps exactly the files it was signed with.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { deleteFile, getFile, putFile } from '../storage/objects';
import { NotFoundError, ValidationError } from './errors';
import { enforce, type Caller } from './guard';

export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;
const TYPES: Record<string, string> = {
  pdf: 'application/pdf',
  png: 'image/png',
  jpg: 'image/jpeg',
  jpeg: 'image/jpeg',
  csv: 'text/csv',
  txt: 'text/plain'
};

async function draftOf(caller: Caller, revisionId: number) {
  const rev = await db()('formulation_revisions').where({ id: revisionId }).first('id', 'state', 'created_by', 'version');
  if (!rev) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  enforce('edit', caller, { state: rev.state, createdBy: rev.created_by, version: rev.version });
  return rev;
}

export async function addAttachment(
  caller: Caller,
  revisionId: number,
  file: { name: string; body: Buffer },
  label: string
): Promise<number> {
  await draftOf(caller, revisionId);
  const ext = file.name.toLowerCase().split('.').pop() ?? '';
  if (!TYPES[ext]) throw new ValidationError(`file: ${file.name} is not one of ${Object.keys(TYPES).join(', ')}; nothing was saved`);
  if (file.body.length === 0) throw new ValidationError('file: the file is empty; nothing was saved');
  if (file.body.length > MAX_ATTACHMENT_BYTES)
    throw new ValidationError(`file: larger than ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB; nothing was saved`);
  const text = label.trim().slice(0, 200) || file.name;
  return writeTransaction(async (trx) => {
    const fileId = await putFile(
      {
        body: file.body,
        originalName: file.name,
        contentType: TYPES[ext],
        purpose: 'attachment',
        entityType: 'formulation_revision',
        entityId: revisionId,
        uploadedBy: caller.id
      },
      trx
    );
    const [id] = await trx('revision_attachments').insert({
      revision_id: revisionId,
      stored_file_id: fileId,
      label: text,
      created_by: caller.id
    });
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'formulation_revision',
        entityId: revisionId,
        action: 'attachment-add',
        after: { attachmentId: id, fileId, name: file.name, label: text, bytes: file.body.length }
      },
      trx
    );
    return id;
  });
}

export async function removeAttachment(caller: Caller, revisionId: number, attachmentId: number): Promise<void> {
  await draftOf(caller, revisionId);
  await writeTransaction(async (trx) => {
    const row = await trx('revision_attachments').where({ id: attachmentId, revision_id: revisionId }).forUpdate().first();
    if (!row) throw new NotFoundError('That attachment is not on this revision.');
    await trx('revision_attachments').where({ id: attachmentId }).delete();
    await deleteFile(row.stored_file_id, trx);
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'formulation_revision',
        entityId: revisionId,
        action: 'attachment-remove',
        before: { attachmentId, fileId: row.stored_file_id, label: row.label }
      },
      trx
    );
  });
}

/** The bytes of an attachment of this revision, or null. */
export async function attachmentFile(revisionId: number, attachmentId: number) {
  const row = await db()('revision_attachments').where({ id: attachmentId, revision_id: revisionId }).first('stored_file_id');
  return row ? getFile(row.stored_file_id) : null;
}
