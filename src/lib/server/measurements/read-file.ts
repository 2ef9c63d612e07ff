/**
 * Reading a measurement file, without the database: gzip unpacked as a stream (./unpack.ts), then either
 * spectra decoded and parsed whole (CSV/TXT columns or rows, IES TM-27) and every part measured by the
 * spectral core, or a tester's per-part table decoded and read piece by piece with its profile. Refusals
 * name the line or part; nothing is saved here.
 * Runs in the request thread or in a worker thread (./read-worker.ts, ./read-pool.ts), so it holds no I/O.
 */
import { decodeText } from '../../spectrum-file/decode';
import { formatBytes } from '../../spectrum-file/parse';
import { parseSpectrumUpload } from '../../spectrum-file/read-upload';
import { EMITTED_QUANTITIES, type Tm27Meta } from '../../spectrum-file/tm27';
import { measurePartsPaced, type MeasuredPart } from '../../measurements/index';
import { MAX_MEASUREMENT_FILE_BYTES, MAX_TABLE_FILE_BYTES } from '../../measurements/schema';
import { TesterTableReader, type TesterTableResult } from '../../tester-table/parse';
import { testerPartMetrics } from '../../tester-table/part-metrics';
import type { TesterProfile } from '../../tester-table/profile';
import { lineIssue, tooLarge, unprocessable } from '../../errors/domain-error';
import { ansiBinOf } from '../../spectral/ansi/c78377';
import { unpackedChunks, unpackUpload } from './unpack';

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
async function readSpectra(name: string, raw: Uint8Array, onProgress?: (p: UploadProgress) => void): Promise<ReadMeasurements> {
  checkSize(name, raw.length, MAX_MEASUREMENT_FILE_BYTES, '');
  const body = await unpackUpload(raw, name, MAX_MEASUREMENT_FILE_BYTES);
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

/**
 * A tester table read as it unpacks: the text decoded piece by piece (UTF-8; when the bytes are not UTF-8 it
 * is read again from the start as Windows-1252, as ../../spectrum-file/decode.ts does) and fed to the reader.
 */
async function streamTable(name: string, raw: Uint8Array, profile: TesterProfile): Promise<TesterTableResult> {
  for (const encoding of ['utf-8', 'windows-1252']) {
    const decoder = new TextDecoder(encoding, { fatal: encoding === 'utf-8' });
    const reader = new TesterTableReader(profile);
    try {
      for await (const chunk of unpackedChunks(raw, name, MAX_TABLE_FILE_BYTES)) {
        reader.write(decoder.decode(chunk, { stream: true }));
        if (reader.done) break; // refused: the rest is not read
        await pause();
      }
      if (!reader.done) reader.write(decoder.decode());
    } catch (err) {
      if (err instanceof TypeError && encoding === 'utf-8') continue;
      throw err;
    }
    return reader.end();
  }
  throw new Error('unreachable');
}

/** Checks a tester table with its profile and turns each row into part metrics; saves nothing. */
async function readTable(
  name: string,
  raw: Uint8Array,
  p: { id: number; version: number; profile: TesterProfile },
  onProgress?: (p: UploadProgress) => void
): Promise<ReadMeasurements> {
  checkSize(name, raw.length, MAX_TABLE_FILE_BYTES, ' for a tester table');
  const { profile } = p;
  onProgress?.({ phase: 'parsing' });
  const parsed = await streamTable(name, raw, profile);
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
  return job.kind === 'table' ? readTable(job.name, job.body, job.profile, onProgress) : readSpectra(job.name, job.body, onProgress);
}

/** Numbers stored per part, in this order, NaN for none (ANSI bin: nominal CCT of the Table 1 quadrangle). */
export const PACKED_COLUMNS = ['x', 'y', 'cct', 'duv', 'ra', 'r9', 'ler', 'ansiBin'] as const;

/**
 * A read file as the upload stores it: per part its label, column (or line) number, metrics and values as
 * JSON text and the numbers of the indexed columns. Built once, where the file was read; few large strings
 * and typed arrays cross a thread boundary in milliseconds, where 100,000 metric objects took a second.
 */
export interface PackedMeasurements {
  count: number;
  labels: string[];
  columnNo: Int32Array;
  /** One JSON document per part, joined by "\n" (JSON text holds no raw line break). */
  metricsJson: string;
  valuesJson: string;
  /** count × PACKED_COLUMNS.length. */
  numbers: Float64Array;
  wavelengths: number[];
  warnings: string[];
  tm27: Tm27Meta | null;
  profile?: { id: number; version: number };
}

// ANSI C78.377-2017 Table 1 (the bin a part's x, y fall in).
export function packMeasurements(m: ReadMeasurements): PackedMeasurements {
  const n = m.parts.length;
  const numbers = new Float64Array(n * PACKED_COLUMNS.length);
  const columnNo = new Int32Array(n);
  const metrics: string[] = new Array(n);
  const values: string[] = new Array(n);
  const or = (v: number | null | undefined) => (v === null || v === undefined ? NaN : v);
  m.parts.forEach((p, i) => {
    const k = p.metrics;
    numbers.set([k.x, k.y, k.cct, k.duv, or(k.ra), or(k.r9), or(k.ler), or(ansiBinOf(k.x, k.y))], i * PACKED_COLUMNS.length);
    columnNo[i] = m.profile ? (p.line ?? i + 2) : i + 2;
    metrics[i] = JSON.stringify(k);
    values[i] = JSON.stringify(m.values[i] ?? []);
  });
  return {
    count: n,
    labels: m.parts.map((p) => p.label),
    columnNo,
    metricsJson: metrics.join('\n'),
    valuesJson: values.join('\n'),
    numbers,
    wavelengths: m.wavelengths,
    warnings: m.warnings,
    tm27: m.tm27,
    profile: m.profile
  };
}

/** Reads a file and packs it for storing. */
export async function readAndPack(job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  return packMeasurements(await readMeasurementFile(job, onProgress));
}
