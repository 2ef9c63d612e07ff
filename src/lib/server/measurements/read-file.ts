/**
 * Reading a measurement file, without the database: gzip unpacked (./unpack.ts), text decoded, then either
 * spectra parsed (CSV/TXT columns or rows, IES TM-27) and every part measured by the spectral core, or a
 * tester's per-part table read with its profile. Refusals name the line or part; nothing is saved here.
 * Runs in the request thread or in a worker thread (./read-worker.ts, ./read-pool.ts), so it holds no I/O.
 */
import { decodeText } from '../../spectrum-file/decode';
import { formatBytes } from '../../spectrum-file/parse';
import { parseSpectrumUpload } from '../../spectrum-file/read-upload';
import { EMITTED_QUANTITIES, type Tm27Meta } from '../../spectrum-file/tm27';
import { measurePartsPaced, type MeasuredPart } from '../../measurements/index';
import { MAX_MEASUREMENT_FILE_BYTES, MAX_TABLE_FILE_BYTES } from '../../measurements/schema';
import { parseTesterTable } from '../../tester-table/parse';
import { testerPartMetrics } from '../../tester-table/part-metrics';
import type { TesterProfile } from '../../tester-table/profile';
import { lineIssue, tooLarge, unprocessable } from '../../errors/domain-error';
import { unpackUpload } from './unpack';

export type UploadProgress = { phase: 'parsing' | 'saving' } | { phase: 'measuring'; done: number; total: number };

/** What a read file gives: parts with metrics (and, for spectra, their values), warnings, the TM-27 header, the profile used. */
export interface ReadMeasurements {
  parts: (MeasuredPart & { line?: number })[];
  wavelengths: number[];
  values: number[][];
  warnings: string[];
  tm27: Tm27Meta | null;
  profile?: { id: number; version: number };
}

export type ReadJob =
  | { kind: 'spectra'; name: string; body: Uint8Array }
  | { kind: 'table'; name: string; body: Uint8Array; profile: { id: number; version: number; profile: TesterProfile } };

const pause = () => new Promise<void>((resolve) => setImmediate(resolve));

function checkSize(name: string, size: number, limit: number, what: string): void {
  if (size === 0) throw unprocessable(`${name || 'The file'} is empty. Nothing was saved.`);
  if (size > limit) throw tooLarge(`The file is ${formatBytes(size)}; the limit${what} is ${formatBytes(limit)}. Nothing was saved.`);
}

/** Checks and reads a spectra file: every part measured; saves nothing. Throws a domain error naming lines or parts. */
async function readSpectra(name: string, raw: Buffer, onProgress?: (p: UploadProgress) => void): Promise<ReadMeasurements> {
  checkSize(name, raw.length, MAX_MEASUREMENT_FILE_BYTES, '');
  const body = unpackUpload(raw, name, MAX_MEASUREMENT_FILE_BYTES);
  onProgress?.({ phase: 'parsing' });
  // CSV/TXT (one column or one row per part) or an IES TM-27 document (one SpectralDistribution per part).
  const parsed = parseSpectrumUpload(decodeText(body), {
    multiColumn: true,
    maxBytes: MAX_MEASUREMENT_FILE_BYTES,
    quantities: EMITTED_QUANTITIES
  });
  if (!parsed.ok) {
    const n = parsed.errors.length;
    throw unprocessable(
      `${name} was not saved: ${n === 1 ? 'one problem' : `${n} problems`} in the file. ${parsed.errors[0].message}`,
      parsed.errors.map((e) => lineIssue(e.line, e.message))
    );
  }
  const measured = await measurePartsPaced(parsed, pause, (done, total) => onProgress?.({ phase: 'measuring', done, total }));
  if (!measured.ok) {
    const issues = measured.errors.map((e) => ({
      path: `part ${e.part}`,
      line: null,
      message: `Part ${e.part} (column ${e.column}): ${e.message}`
    }));
    throw unprocessable(
      `${name} was not saved: ${issues.length === 1 ? 'one part' : `${issues.length} parts`} cannot be measured. ${issues[0].message}`,
      issues
    );
  }
  return {
    parts: measured.parts,
    wavelengths: parsed.wavelengths,
    values: parsed.columns.map((c) => c.values),
    warnings: parsed.warnings,
    tm27: parsed.tm27
  };
}

/** Checks a tester table with its profile and turns each row into part metrics; saves nothing. */
function readTable(
  name: string,
  raw: Buffer,
  p: { id: number; version: number; profile: TesterProfile },
  onProgress?: (p: UploadProgress) => void
): ReadMeasurements {
  checkSize(name, raw.length, MAX_TABLE_FILE_BYTES, ' for a tester table');
  const body = unpackUpload(raw, name, MAX_TABLE_FILE_BYTES);
  const { profile } = p;
  onProgress?.({ phase: 'parsing' });
  const parsed = parseTesterTable(decodeText(body), profile);
  if (!parsed.ok) {
    const n = parsed.errors.length;
    throw unprocessable(
      `${name} was not saved (tester profile "${profile.name}"): ${n === 1 ? 'one problem' : `${n} problems`}. ${parsed.errors[0].message}`,
      parsed.errors.map((e) => lineIssue(e.line, e.message))
    );
  }
  const parts = parsed.rows.map((r) => ({ label: r.label, metrics: testerPartMetrics(r, profile.chromaticity), line: r.line }));
  onProgress?.({ phase: 'measuring', done: parts.length, total: parts.length });
  return {
    parts,
    wavelengths: [],
    values: parts.map(() => []),
    warnings: [`read with tester profile "${profile.name}" (version ${p.version})`, ...parsed.warnings],
    tm27: null,
    profile: { id: p.id, version: p.version }
  };
}

/** Reads one measurement file (spectra or a tester table). */
export async function readMeasurementFile(job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<ReadMeasurements> {
  const raw = Buffer.from(job.body.buffer, job.body.byteOffset, job.body.byteLength);
  return job.kind === 'table' ? readTable(job.name, raw, job.profile, onProgress) : readSpectra(job.name, raw, onProgress);
}
