/** Stored files of a batch that the measurements page offers: raw measurement exports and batch records. */
import { getFile, safeFileName } from '../storage/objects';

const PURPOSES = ['measurement', 'batch-record'];

export async function batchFile(batchId: number, fileId: number): Promise<{ name: string; contentType: string; body: Buffer } | null> {
  if (!Number.isSafeInteger(batchId) || batchId <= 0 || !Number.isSafeInteger(fileId) || fileId <= 0) return null;
  const f = await getFile(fileId);
  if (!f || f.row.entityType !== 'batch' || f.row.entityId !== String(batchId) || !PURPOSES.includes(f.row.purpose)) return null;
  const contentType = f.row.purpose === 'batch-record' ? 'application/pdf' : 'text/plain; charset=utf-8';
  return { name: safeFileName(f.row.originalName), contentType, body: f.body };
}
