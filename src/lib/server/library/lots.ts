/** Supplier lots of a material, each optionally with its certificate of analysis (PDF in object storage). */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { deleteFile, putFile } from '../storage/objects';
import { conflict, notFound as notFoundError } from '../../errors/domain-error';
import { notFound } from './errors';
import { assertPdf } from './pdf-file';
import * as records from './records';
import type { User } from '../accounts/users';
import type { Lot } from '../../library/types';

export type { Lot } from '../../library/types';

export interface LotInput {
  lotNumber: string;
  supplier: string | null;
  receivedOn: string | null;
  expiresOn: string | null;
  notes: string | null;
}

const isoDate = (v: unknown): string | null =>
  v == null ? null : v instanceof Date ? v.toISOString().slice(0, 10) : String(v).slice(0, 10);

export async function list(materialId: number): Promise<Lot[]> {
  const rows: Record<string, unknown>[] = await db()('material_lots as l')
    .leftJoin('stored_files as f', 'f.id', 'l.certificate_file_id')
    .leftJoin('users as u', 'u.id', 'l.created_by')
    .where('l.material_id', materialId)
    .orderByRaw('l.received_on IS NULL, l.received_on DESC')
    .orderBy('l.id', 'desc')
    .select('l.*', 'f.original_name', 'u.name as user_name');
  return rows.map((r) => ({
    id: Number(r.id),
    materialId: Number(r.material_id),
    lotNumber: String(r.lot_number),
    supplier: (r.supplier as string) ?? null,
    receivedOn: isoDate(r.received_on),
    expiresOn: isoDate(r.expires_on),
    certificateFileId: r.certificate_file_id == null ? null : Number(r.certificate_file_id),
    certificateName: (r.original_name as string) ?? null,
    notes: (r.notes as string) ?? null,
    createdByName: (r.user_name as string) ?? null,
    createdAt: r.created_at as Date
  }));
}

export async function add(actor: User, materialId: number, input: LotInput, certificate?: { name: string; body: Buffer }): Promise<number> {
  const material = await records.get(materialId);
  if (!material) throw notFound(materialId);
  if (material.archivedAt) throw conflict(`${material.code} is archived; restore it before adding lots.`);
  if (certificate) await assertPdf(certificate.name, certificate.body);
  try {
    return await writeTransaction(async (trx) => {
      const [id] = await trx('material_lots').insert({
        material_id: materialId,
        lot_number: input.lotNumber,
        supplier: input.supplier ?? material.supplier,
        received_on: input.receivedOn,
        expires_on: input.expiresOn,
        notes: input.notes,
        created_by: actor.id
      });
      if (certificate) {
        const fileId = await putFile(
          {
            body: certificate.body,
            originalName: certificate.name,
            contentType: 'application/pdf',
            purpose: 'certificate',
            entityType: 'material-lot',
            entityId: id,
            uploadedBy: actor.id
          },
          trx
        );
        await trx('material_lots').where({ id }).update({ certificate_file_id: fileId });
      }
      await audit.record(
        {
          actorId: actor.id,
          actorEmail: actor.email,
          entityType: 'material',
          entityId: materialId,
          action: 'lot-add',
          after: { lotId: id, ...input, certificate: certificate?.name ?? null }
        },
        trx
      );
      return id;
    });
  } catch (err) {
    if ((err as { code?: string })?.code === 'ER_DUP_ENTRY')
      throw conflict(`Lot ${input.lotNumber} is already recorded for ${material.code}.`);
    throw err;
  }
}

export async function remove(actor: User, materialId: number, lotId: number): Promise<void> {
  try {
    await writeTransaction(async (trx) => {
      const lot = await trx('material_lots').where({ id: lotId, material_id: materialId }).forUpdate().first();
      if (!lot) throw notFoundError(`Lot ${lotId} of material ${materialId} was not found.`);
      await trx('material_lots').where({ id: lotId }).delete();
      if (lot.certificate_file_id) await deleteFile(lot.certificate_file_id, trx);
      await audit.record(
        {
          actorId: actor.id,
          actorEmail: actor.email,
          entityType: 'material',
          entityId: materialId,
          action: 'lot-remove',
          before: { lotId, lotNumber: lot.lot_number }
        },
        trx
      );
    });
  } catch (err) {
    if ((err as { code?: string })?.code === 'ER_ROW_IS_REFERENCED_2')
      throw conflict('This lot is referenced by batch records and cannot be removed.');
    throw err;
  }
}
