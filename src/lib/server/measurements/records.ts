/**
 * Rows of the quality tables (measurement uploads, measured parts, acceptance, corrections,
 * dispositions) mapped to the view records the page and API show. Snake_case → camelCase.
 */
import type { Knex } from 'knex';
import type { OperatingCondition } from '../../aim/condition';
import { db } from '../db/index';
import type { MeasuredPart, PartMetrics } from '../../measurements/types';
import type { CorrectionView, DispositionView, UploadView } from '../../measurements/view';

type Q = Knex | Knex.Transaction;
const iso = (d: Date | string | null): string | null => (d === null ? null : new Date(d).toISOString());

export async function listUploads(batchId: number, k: Q = db()): Promise<UploadView[]> {
  const rows = await k('measurement_uploads as m')
    .leftJoin('users as u', 'u.id', 'm.uploaded_by')
    .leftJoin('users as w', 'w.id', 'm.withdrawn_by')
    .where('m.batch_id', batchId)
    .orderBy('m.id')
    .select('m.*', 'u.name as uploaded_by_name', 'w.name as withdrawn_by_name');
  return rows.map((r) => ({
    id: r.id,
    originalName: r.original_name,
    partsCount: r.parts_count,
    storedFileId: r.stored_file_id,
    uploadedByName: r.uploaded_by_name ?? '—',
    createdAt: iso(r.created_at)!,
    withdrawnAt: iso(r.withdrawn_at),
    withdrawnByName: r.withdrawn_by_name ?? null,
    withdrawReason: r.withdraw_reason ?? null,
    condition: conditionOfUpload(r)
  }));
}

/** The test condition stored with an upload; null for the bench. */
export function conditionOfUpload(r: {
  test_reference?: string | null;
  test_temperature_c?: number | string | null;
  test_current_ma?: number | string | null;
}): OperatingCondition | null {
  if (r.test_temperature_c === null || r.test_temperature_c === undefined) return null;
  return {
    reference: r.test_reference === 'solderPoint' ? 'solderPoint' : 'junction',
    temperatureC: Number(r.test_temperature_c),
    driveCurrentMa: r.test_current_ma === null || r.test_current_ma === undefined ? null : Number(r.test_current_ma)
  };
}

export interface StoredPart extends MeasuredPart {
  id: number;
  uploadId: number;
  /** Test condition of the part's upload; null = bench. */
  condition: OperatingCondition | null;
}

/** The batch's uploads that are not withdrawn, with their test condition (a handful of rows). */
function activeUploads(
  batchId: number,
  k: Q
): Promise<{ id: number; test_reference: string | null; test_temperature_c: number | null; test_current_ma: number | null }[]> {
  return k('measurement_uploads')
    .where({ batch_id: batchId })
    .whereNull('withdrawn_at')
    .select('id', 'test_reference', 'test_temperature_c', 'test_current_ma');
}

/**
 * Parts of the batch's uploads that are not withdrawn, in upload and column order. The uploads are read first
 * (a handful), then the parts along the (upload, column) index — no sort of 100,000 rows with their JSON.
 */
export async function activeParts(batchId: number, k: Q = db()): Promise<StoredPart[]> {
  const uploads = await activeUploads(batchId, k);
  if (!uploads.length) return [];
  const conditions = new Map(uploads.map((u) => [u.id as number, conditionOfUpload(u)]));
  const rows = await k
    .from(k.raw('?? FORCE INDEX (??)', ['part_measurements', 'part_measurements_upload_column_index']))
    .whereIn(
      'upload_id',
      uploads.map((u) => u.id)
    )
    .orderBy('upload_id')
    .orderBy('column_no')
    .select('id', 'upload_id', 'part_label', 'metrics_json');
  return rows.map((r) => ({
    id: r.id,
    uploadId: r.upload_id,
    label: r.part_label,
    metrics: JSON.parse(r.metrics_json) as PartMetrics,
    condition: conditions.get(r.upload_id) ?? null
  }));
}

/**
 * Labels of the batch's parts that are not withdrawn. The batch's active uploads are read first, then their
 * parts along the (upload, column) index: a join from the uploads side could walk every upload's parts.
 */
export async function activeLabels(batchId: number, k: Q = db()): Promise<Set<string>> {
  const uploads = await activeUploads(batchId, k);
  if (!uploads.length) return new Set();
  const rows: { part_label: string }[] = await k('part_measurements')
    .whereIn(
      'upload_id',
      uploads.map((u) => u.id)
    )
    .select('part_label');
  return new Set(rows.map((r) => r.part_label));
}

export interface AcceptanceRow {
  mode: 'revision' | 'steps';
  steps: number | null;
  requireTargetBin: boolean;
  version: number;
}

export async function getAcceptance(batchId: number, k: Q = db()): Promise<AcceptanceRow | null> {
  const r = await k('batch_acceptance').where({ batch_id: batchId }).first();
  return r
    ? {
        mode: r.mode,
        steps: r.steps === null ? null : Number(r.steps),
        requireTargetBin: Boolean(r.require_target_bin),
        version: r.version
      }
    : null;
}

export async function listCorrections(batchId: number, k: Q = db()): Promise<CorrectionView[]> {
  const rows = await k('batch_corrections as c')
    .leftJoin('formulation_revisions as r', 'r.id', 'c.revision_id')
    .leftJoin('users as u', 'u.id', 'c.created_by')
    .where('c.batch_id', batchId)
    .orderBy('c.id')
    .select('c.*', 'r.revision_no', 'r.state as revision_state', 'u.name as created_by_name');
  return rows.map((r) => ({
    id: r.id,
    revisionId: r.revision_id,
    revisionNo: r.revision_no,
    revisionState: r.revision_state ?? null,
    stepFraction: Number(r.step_fraction),
    measuredMean: { x: r.measured_x, y: r.measured_y },
    predicted: { x: r.predicted_x, y: r.predicted_y, cct: r.predicted_cct_k, duv: r.predicted_duv },
    createdByName: r.created_by_name ?? '—',
    createdAt: iso(r.created_at)!
  }));
}

export async function getDisposition(batchId: number, k: Q = db()): Promise<DispositionView | null> {
  const r = await k('batch_dispositions').where({ batch_id: batchId }).first();
  if (!r) return null;
  return {
    decision: r.decision,
    signerName: r.signer_name,
    signerEmail: r.signer_email,
    meaning: r.meaning,
    comment: r.comment,
    signedAt: iso(r.signed_at)!,
    contentSha256: r.content_sha256,
    recordFileId: r.record_file_id ?? null
  };
}

/** One upload's shared wavelengths, IES TM-27 header (if it came from one) and its active parts' spectra. */
export async function uploadSpectra(
  batchId: number,
  uploadId: number,
  k: Q = db()
): Promise<{ name: string; wavelengths: number[]; tm27Json: string | null; parts: { label: string; values: number[] }[] } | null> {
  const upload = await k('measurement_uploads').where({ id: uploadId, batch_id: batchId }).first();
  if (!upload) return null;
  const rows = await k('part_measurements').where({ upload_id: uploadId }).orderBy('column_no').select('part_label', 'values_json');
  return {
    name: upload.original_name,
    wavelengths: JSON.parse(upload.wavelengths_json) as number[],
    tm27Json: upload.tm27_json,
    parts: rows.map((r) => ({ label: r.part_label, values: JSON.parse(r.values_json) as number[] }))
  };
}
