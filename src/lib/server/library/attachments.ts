/** Documents of a material (safety data sheets, certificates, other PDFs) in object storage. */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { deleteFile, listFilesFor, putFile, toStoredFile, type StoredFileRow } from '../storage/objects';
import { ATTACHMENT_PURPOSES } from '../../library/schema';
import { notFound as notFoundError } from '../../errors/domain-error';
import { notFound } from './errors';
import { assertPdf } from './pdf-file';
import * as records from './records';
import type { User } from '../accounts/users';

export function list(materialId: number): Promise<StoredFileRow[]> {
  return listFilesFor('material', materialId, ATTACHMENT_PURPOSES);
}

export async function add(
  actor: User,
  materialId: number,
  purpose: (typeof ATTACHMENT_PURPOSES)[number],
  file: { name: string; body: Buffer }
): Promise<number> {
  if (!(await records.get(materialId))) throw notFound(materialId);
  await assertPdf(file.name, file.body);
  return writeTransaction(async (trx) => {
    const id = await putFile(
      {
        body: file.body,
        originalName: file.name,
        contentType: 'application/pdf',
        purpose,
        entityType: 'material',
        entityId: materialId,
        uploadedBy: actor.id
      },
      trx
    );
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'material',
        entityId: materialId,
        action: 'attachment-add',
        after: { fileId: id, purpose, name: file.name }
      },
      trx
    );
    return id;
  });
}

export async function remove(actor: User, materialId: number, fileId: number): Promise<void> {
  await writeTransaction(async (trx) => {
    const row = await trx('stored_files')
      .where({ id: fileId, entity_type: 'material', entity_id: String(materialId) })
      .whereIn('purpose', ATTACHMENT_PURPOSES)
      .forUpdate()
      .first();
    if (!row) throw notFoundError('That document was not found on this material.');
    await deleteFile(fileId, trx);
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'material',
        entityId: materialId,
        action: 'attachment-remove',
        before: { fileId, purpose: row.purpose, name: row.original_name }
      },
      trx
    );
  });
}

/** A stored file that belongs to this material (document, spectrum source, or a lot's certificate), else null. */
export async function fileOfMaterial(materialId: number, fileId: number): Promise<StoredFileRow | null> {
  const lotIds = (await db()('material_lots').where({ material_id: materialId }).select('id')).map((r) => String(r.id));
  const row = await db()('stored_files')
    .where({ id: fileId })
    .where((w) =>
      w
        .where({ entity_type: 'material', entity_id: String(materialId) })
        .orWhere((o) => o.where('entity_type', 'material-lot').whereIn('entity_id', lotIds.length ? lotIds : ['-']))
    )
    .first();
  return row ? toStoredFile(row) : null;
}
