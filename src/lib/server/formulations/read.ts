/**
 * Read side of formulations for every feature: one revision, the current approved revision of a
 * formulation, and the signatures and attachments of a revision. Lists live in ./lists.ts.
 */
import type { Knex } from 'knex';
import { db } from '../db/index';
import { REVISION_COLUMNS, toRevisionRecord, type RevisionRecord, type RevisionRow } from './records';
import { storedContentSha256 } from './hash';
import type { AttachmentRecord, FormulationRecord, SignatureRecord } from '../../formulations/types';

export type { RevisionRecord } from './records';
export type { AttachmentRecord, FormulationRecord, SignatureRecord } from '../../formulations/types';

export function revisionQuery(k: Knex | Knex.Transaction = db()): Knex.QueryBuilder {
  return k('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .leftJoin('users as cu', 'cu.id', 'r.created_by')
    .leftJoin('users as du', 'du.id', 'r.decided_by')
    .select(REVISION_COLUMNS);
}

export async function getRevision(id: number, k?: Knex | Knex.Transaction): Promise<RevisionRecord | null> {
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  const row: RevisionRow | undefined = await revisionQuery(k).where('r.id', id).first();
  return row ? toRevisionRecord(row) : null;
}

/** Whether the stored content still matches its recorded SHA-256 (checked over the stored text, as signed). */
export async function storedContentVerified(id: number, k: Knex | Knex.Transaction = db()): Promise<boolean> {
  const row: { content_json: string; content_sha256: string } | undefined = await k('formulation_revisions')
    .where({ id })
    .first('content_json', 'content_sha256');
  return row !== undefined && storedContentSha256(row.content_json) === row.content_sha256;
}

/** The approved revision the line builds from, or null when none is approved. */
export async function currentApprovedRevision(formulationId: number, k?: Knex | Knex.Transaction): Promise<RevisionRecord | null> {
  const row: RevisionRow | undefined = await revisionQuery(k).where({ 'r.formulation_id': formulationId, 'r.state': 'approved' }).first();
  return row ? toRevisionRecord(row) : null;
}

export async function getFormulation(id: number): Promise<FormulationRecord | null> {
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  const r = await db()('formulations as f')
    .leftJoin('users as u', 'u.id', 'f.created_by')
    .where('f.id', id)
    .first('f.*', 'u.name as created_by_name');
  if (!r) return null;
  return {
    id: r.id,
    code: r.code,
    name: r.name,
    description: r.description,
    version: r.version,
    createdBy: r.created_by,
    createdByName: r.created_by_name,
    createdAt: r.created_at,
    updatedAt: r.updated_at
  };
}

export async function listSignatures(revisionId: number): Promise<SignatureRecord[]> {
  const rows = await db()('revision_signatures').where({ revision_id: revisionId }).orderBy('id');
  return rows.map((s) => ({
    id: s.id,
    revisionId: s.revision_id,
    signerId: s.signer_id,
    signerName: s.signer_name,
    signerEmail: s.signer_email,
    meaning: s.meaning,
    comment: s.comment,
    signedAt: s.signed_at,
    contentSha256: s.content_sha256
  }));
}

export async function listAttachments(revisionId: number): Promise<AttachmentRecord[]> {
  const rows = await db()('revision_attachments as a')
    .join('stored_files as s', 's.id', 'a.stored_file_id')
    .where('a.revision_id', revisionId)
    .orderBy('a.id')
    .select('a.id', 'a.stored_file_id', 'a.label', 's.original_name', 's.content_type', 's.bytes', 'a.created_at');
  return rows.map((a) => ({
    id: a.id,
    storedFileId: a.stored_file_id,
    label: a.label,
    originalName: a.original_name,
    contentType: a.content_type,
    bytes: a.bytes,
    createdAt: a.created_at
  }));
}
