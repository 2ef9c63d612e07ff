/**
 * Files in object storage (S3 API) with their metadata in `stored_files`.
 * `putFile` uploads first, then writes the row (inside the caller's transaction when given);
 * if the row cannot be written the object is removed again. A caller whose later database
 * step fails calls `deleteStoredObject(key)` after its rollback, so no object is left orphaned.
 */
import { createHash, randomUUID } from 'node:crypto';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import type { Knex } from 'knex';
import { db } from '../db/index';
import { bucket, ensureBucket, s3 } from './client';
import type { StoredFileRow } from '../../storage/types';
import { invalid } from '../../errors/domain-error';
import { hiddenCharacterReason } from '../../errors/hidden-characters';

export type { StoredFileRow } from '../../storage/types';

export const FILE_PURPOSES = [
  'spectrum-source',
  'safety-data-sheet',
  'certificate',
  'ticket',
  'batch-record',
  'measurement',
  'attachment'
] as const;
export type FilePurpose = (typeof FILE_PURPOSES)[number];

export interface PutFileInput {
  body: Buffer;
  originalName: string;
  contentType: string;
  purpose: FilePurpose | string;
  entityType?: string | null;
  entityId?: string | number | null;
  uploadedBy?: number | null;
}

interface DbRow {
  id: number;
  storage_key: string;
  original_name: string;
  content_type: string;
  bytes: number;
  sha256: string;
  purpose: string;
  entity_type: string | null;
  entity_id: string | null;
  uploaded_by: number | null;
  created_at: Date;
}

export function toStoredFile(r: DbRow): StoredFileRow {
  return {
    id: r.id,
    storageKey: r.storage_key,
    originalName: r.original_name,
    contentType: r.content_type,
    bytes: r.bytes,
    sha256: r.sha256,
    purpose: r.purpose,
    entityType: r.entity_type,
    entityId: r.entity_id,
    uploadedBy: r.uploaded_by,
    createdAt: r.created_at
  };
}

/** A file name safe for keys and Content-Disposition: letters, digits, dot, dash, underscore. */
export function safeFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const cleaned = base
    .normalize('NFKD')
    .replace(/[^\w.-]+/g, '_')
    .replace(/^[._]+/, '')
    .slice(-120);
  return cleaned || 'file';
}

/** Refuses a file name with control or text-direction characters (it would be shown and downloaded disguised). */
export function assertPlainFileName(name: string): void {
  const reason = hiddenCharacterReason(name, 'The file name');
  if (reason) throw invalid(`${reason}. Nothing was saved.`, [{ path: 'file', message: reason }]);
}

export async function putFile(input: PutFileInput, trx?: Knex.Transaction): Promise<number> {
  assertPlainFileName(input.originalName);
  await ensureBucket();
  const sha256 = createHash('sha256').update(input.body).digest('hex');
  const key = `${input.purpose}/${new Date().toISOString().slice(0, 7)}/${randomUUID()}-${safeFileName(input.originalName)}`;
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: input.body, ContentType: input.contentType }));
  try {
    const [id] = await (trx ?? db())('stored_files').insert({
      storage_key: key,
      original_name: input.originalName.slice(0, 255) || 'file',
      content_type: input.contentType.slice(0, 120) || 'application/octet-stream',
      bytes: input.body.length,
      sha256,
      purpose: input.purpose,
      entity_type: input.entityType ?? null,
      entity_id: input.entityId == null ? null : String(input.entityId),
      uploaded_by: input.uploadedBy ?? null
    });
    if (trx) trx.executionPromise.catch(() => deleteStoredObject(key));
    return id;
  } catch (err) {
    await deleteStoredObject(key);
    throw err;
  }
}

export async function getFileRow(id: number): Promise<StoredFileRow | null> {
  const row: DbRow | undefined = await db()('stored_files').where({ id }).first();
  return row ? toStoredFile(row) : null;
}

export async function getFile(id: number): Promise<{ row: StoredFileRow; body: Buffer } | null> {
  const row = await getFileRow(id);
  if (!row) return null;
  const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: row.storageKey }));
  const bytes = await out.Body!.transformToByteArray();
  return { row, body: Buffer.from(bytes) };
}

/** Removes an object; a missing object is not an error (clean-up must be safe to repeat). */
export async function deleteStoredObject(key: string): Promise<void> {
  try {
    await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status !== 404) console.error('[phosforge] could not remove stored object', key, err instanceof Error ? err.message : err);
  }
}

/** Deletes the row (in the caller's transaction) and, once that commits, the object. */
export async function deleteFile(id: number, trx?: Knex.Transaction): Promise<boolean> {
  const q = trx ?? db();
  const row: DbRow | undefined = await q('stored_files').where({ id }).first();
  if (!row) return false;
  await q('stored_files').where({ id }).delete();
  if (trx)
    trx.executionPromise.then(
      () => deleteStoredObject(row.storage_key),
      () => undefined
    );
  else await deleteStoredObject(row.storage_key);
  return true;
}

export async function listFilesFor(entityType: string, entityId: string | number, purposes?: readonly string[]): Promise<StoredFileRow[]> {
  const q = db()('stored_files').where({ entity_type: entityType, entity_id: String(entityId) });
  if (purposes?.length) q.whereIn('purpose', purposes);
  const rows: DbRow[] = await q.orderBy('created_at', 'desc').orderBy('id', 'desc');
  return rows.map(toStoredFile);
}
