/**
 * Measurement upload for a batch (gzip accepted). The file is read and checked completely before anything
 * is written (./read-file.ts, in a worker thread in the built app: ./read-pool.ts): spectra through the
 * parser and every part through the spectral core, or a tester table through its profile; part names must
 * be new to the batch. Only then are the raw file (object
 * storage), the upload and its parts saved — one transaction; the object is removed if it fails.
 * `onProgress` reports the phases and the parts measured so far (the API streams them).
 */
import type { Knex } from 'knex';
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { putFile } from '../storage/objects';
import { QUALITY_CORE_VERSION } from '../../measurements/version';
import { getTesterProfile } from './tester-profiles';
import { readOffThread } from './read-pool';
import { PACKED_COLUMNS, type PackedMeasurements, type UploadProgress } from './read-file';
import { lockBatch } from '../batches/lock';
import { lineIssue, unprocessable, type DomainError } from '../../errors/domain-error';
import { conflict, notFound } from './errors';
import { requireQuality, type Caller } from './caller';
import * as records from './records';
import { getBatch } from '../batches/read';
import { predictedPoint } from './results';
import { judgingBasis } from '../../measurements/test-condition';
import type { OperatingCondition } from '../../aim/condition';

export interface MeasurementFile {
  name: string;
  contentType: string;
  body: Buffer;
  /** The condition the parts were measured at; null or absent = the bench (25 °C). */
  condition?: OperatingCondition | null;
  /** A tester's per-part table read with this profile; absent = spectra (CSV/TXT columns or IES TM-27). */
  testerProfileId?: number | null;
}

export type { UploadProgress } from './read-file';

export interface UploadResult {
  uploadId: number;
  parts: number;
  warnings: string[];
}

const OPEN_STATES = ['complete'];
const CHUNK = 100;
/** Table rows are small (no spectrum): more per insert. */
const TABLE_CHUNK = 1000;

function stateRefusal(batchNumber: string, state: string): DomainError {
  if (state === 'released' || state === 'rejected') return conflict(`Batch ${batchNumber} is ${state}: its measurements are closed.`);
  return conflict(`Batch ${batchNumber} is ${state}: parts are measured once the weigh-out is complete.`);
}

/** Checks the file and reads its parts (spectra, or a tester table with its profile); saves nothing. Off the request thread when built. */
export async function readFile(file: MeasurementFile, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  const body = new Uint8Array(file.body.buffer, file.body.byteOffset, file.body.byteLength);
  if (!file.testerProfileId) return readOffThread({ kind: 'spectra', name: file.name, body }, onProgress);
  const { id, version, profile } = await getTesterProfile(file.testerProfileId);
  return readOffThread({ kind: 'table', name: file.name, body, profile: { id, version, profile } }, onProgress);
}

/** Writes a checked file: the raw file to object storage, the upload and its parts (inside `trx`). */
export async function insertMeasurements(
  trx: Knex.Transaction,
  batchId: number,
  file: MeasurementFile,
  m: PackedMeasurements,
  uploadedBy: number
): Promise<{ uploadId: number; storedFileId: number }> {
  const storedFileId = await putFile(
    {
      body: file.body,
      originalName: file.name,
      contentType: file.contentType || 'text/plain',
      purpose: 'measurement',
      entityType: 'batch',
      entityId: batchId,
      uploadedBy
    },
    trx
  );
  const [uploadId] = await trx('measurement_uploads').insert({
    batch_id: batchId,
    stored_file_id: storedFileId,
    original_name: file.name.slice(0, 255) || 'measurements',
    parts_count: m.count,
    wavelengths_json: JSON.stringify(m.wavelengths),
    warnings_json: JSON.stringify(m.warnings),
    tm27_json: m.tm27 ? JSON.stringify(m.tm27) : null,
    source_kind: m.profile ? 'table' : 'spectra',
    tester_profile_id: m.profile?.id ?? null,
    tester_profile_version: m.profile?.version ?? null,
    test_reference: file.condition ? file.condition.reference : null,
    test_temperature_c: file.condition ? file.condition.temperatureC : null,
    test_current_ma: file.condition ? file.condition.driveCurrentMa : null,
    core_version: QUALITY_CORE_VERSION,
    uploaded_by: uploadedBy
  });
  const metrics = m.metricsJson.split('\n');
  const values = m.valuesJson.split('\n');
  const W = PACKED_COLUMNS.length;
  const num = (v: number) => (Number.isNaN(v) ? null : v);
  const rowOf = (i: number) => {
    const at = i * W;
    return {
      upload_id: uploadId,
      batch_id: batchId,
      part_label: m.labels[i].slice(0, 80),
      column_no: m.columnNo[i],
      values_json: values[i],
      metrics_json: metrics[i],
      x: m.numbers[at],
      y: m.numbers[at + 1],
      cct_k: m.numbers[at + 2],
      duv: m.numbers[at + 3],
      ra: num(m.numbers[at + 4]),
      r9: num(m.numbers[at + 5]),
      ler_lm_per_w: num(m.numbers[at + 6]),
      ansi_bin: num(m.numbers[at + 7])
    };
  };
  // Two chunks in flight on the transaction's connection: while the server stores one, the next is built and
  // written out (the driver queues it), so building and storing overlap; memory stays at two chunks.
  const chunk = m.profile ? TABLE_CHUNK : CHUNK;
  let inFlight: Promise<unknown> | null = null;
  for (let i = 0; i < m.count; i += chunk) {
    const rows = Array.from({ length: Math.min(chunk, m.count - i) }, (_, k) => rowOf(i + k));
    const next = trx('part_measurements').insert(rows).then();
    next.catch(() => undefined); // awaited below; marked handled in case the chunk before it fails first
    if (inFlight) await inFlight;
    inFlight = next;
  }
  await inFlight;
  return { uploadId, storedFileId };
}

/**
 * A file measured at a condition the revision has no prediction for is refused before anything is
 * read or saved (a bench file of a hot-aimed revision is judged against its cold check).
 */
async function checkTestCondition(batchId: number, file: MeasurementFile): Promise<void> {
  const revision = (await getBatch(batchId))?.revision;
  if (!revision) return;
  const basis = judgingBasis(revision.content, predictedPoint(revision), file.condition ?? null);
  if (basis.status === 'refused') throw unprocessable(`${file.name} was not saved: ${basis.reason}`, [lineIssue(null, basis.reason)]);
}

/** Refuses early (before reading the file) when the caller or the batch cannot take measurements. */
export async function precheckUpload(caller: Caller, batchId: number): Promise<void> {
  requireQuality(caller, 'Uploading measurements');
  const batch = await db()('batches').where({ id: batchId }).first('id', 'batch_number', 'state');
  if (!batch) throw notFound(`Batch ${batchId}`);
  if (!OPEN_STATES.includes(batch.state)) throw stateRefusal(batch.batch_number, batch.state);
}

export async function uploadMeasurements(
  caller: Caller,
  batchId: number,
  file: MeasurementFile,
  onProgress?: (p: UploadProgress) => void
): Promise<UploadResult> {
  await precheckUpload(caller, batchId);
  await checkTestCondition(batchId, file);
  const m = await readFile(file, onProgress);
  onProgress?.({ phase: 'saving' });
  return writeTransaction(async (trx) => {
    const locked = await lockBatch(trx, batchId);
    if (!OPEN_STATES.includes(locked.state)) throw stateRefusal(locked.batch_number, locked.state);
    const existing = await records.activeLabels(batchId, trx);
    const repeated = m.labels.filter((label) => existing.has(label));
    if (repeated.length) {
      const list = repeated.slice(0, 10).join(', ') + (repeated.length > 10 ? ` and ${repeated.length - 10} more` : '');
      throw conflict(
        `${file.name} was not saved: ${repeated.length === 1 ? 'part' : 'parts'} ${list} ` +
          `already measured for batch ${locked.batch_number}. Withdraw the earlier upload ` +
          `first to measure again.`
      );
    }
    const { uploadId, storedFileId } = await insertMeasurements(trx, batchId, file, m, caller.id);
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'measurements-upload',
        after: {
          uploadId,
          storedFileId,
          file: file.name,
          parts: m.count,
          coreVersion: QUALITY_CORE_VERSION,
          ...(m.profile ? { testerProfileId: m.profile.id, testerProfileVersion: m.profile.version } : {})
        }
      },
      trx
    );
    return { uploadId, parts: m.count, warnings: m.warnings };
  });
}

/** Takes an upload out of the batch's results (kept on record with the reason); only before the disposition. */
export async function withdrawUpload(caller: Caller, batchId: number, uploadId: number, reason: string): Promise<void> {
  requireQuality(caller, 'Withdrawing measurements');
  await writeTransaction(async (trx) => {
    const locked = await lockBatch(trx, batchId);
    if (!OPEN_STATES.includes(locked.state)) throw stateRefusal(locked.batch_number, locked.state);
    const up = await trx('measurement_uploads').where({ id: uploadId, batch_id: batchId }).forUpdate().first();
    if (!up) throw notFound(`Upload ${uploadId} of batch ${locked.batch_number}`);
    if (up.withdrawn_at) throw conflict(`${up.original_name} was already withdrawn.`);
    const now = new Date();
    await trx('measurement_uploads')
      .where({ id: uploadId })
      .update({ withdrawn_at: now, withdrawn_by: caller.id, withdraw_reason: reason });
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'measurements-withdraw',
        before: { uploadId, parts: up.parts_count },
        after: { withdrawnAt: now.toISOString(), reason }
      },
      trx
    );
  });
}
