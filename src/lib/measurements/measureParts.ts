/**
 * Measured spectra of a batch → metrics of each part. Input is what the spectrum-file parser
 * gives: one wavelength column and one intensity column per part. Every part is evaluated; parts
 * the core refuses are all reported (with their column), so an upload either measures every
 * part or saves nothing. `onProgress(done, total)` is called as parts are evaluated.
 */
import { SpectrumInputError } from '../spectral/errors';
import { partMetrics } from './partMetrics';
import type { MeasuredPart } from './types';

export interface PartColumns {
  wavelengths: number[];
  columns: { name: string; values: number[] }[];
}

export interface PartError {
  part: string;
  /** 1-based column of the part in the file (wavelength column = 1). */
  column: number;
  message: string;
}

export type MeasureResult = { ok: true; parts: MeasuredPart[] } | { ok: false; errors: PartError[] };

export const MAX_PARTS_PER_UPLOAD = 2000;

/** Evaluates the parts one by one, yielding (done, total) after each; returns the result. */
export function* measurePartsStepwise(input: PartColumns): Generator<{ done: number; total: number }, MeasureResult> {
  const total = input.columns.length;
  if (total === 0)
    return {
      ok: false,
      errors: [{ part: '(file)', column: 1, message: 'no intensity column: a file needs a wavelength column and at least one part column' }]
    };
  if (total > MAX_PARTS_PER_UPLOAD)
    return { ok: false, errors: [{ part: '(file)', column: 1, message: `${total} parts in one file; at most ${MAX_PARTS_PER_UPLOAD}` }] };
  const parts: MeasuredPart[] = [];
  const errors: PartError[] = [];
  const seen = new Map<string, number>();
  for (let i = 0; i < total; i++) {
    const col = input.columns[i];
    const label = col.name.trim();
    const column = i + 2;
    const prior = seen.get(label);
    if (!label) errors.push({ part: `(column ${column})`, column, message: 'part name is empty' });
    else if (prior !== undefined) errors.push({ part: label, column, message: `part name repeats column ${prior}` });
    else {
      seen.set(label, column);
      try {
        parts.push({ label, metrics: partMetrics({ wavelengths: input.wavelengths, values: col.values }) });
      } catch (err) {
        if (!(err instanceof SpectrumInputError)) throw err;
        errors.push({ part: label, column, message: err.message });
      }
    }
    yield { done: i + 1, total };
  }
  return errors.length ? { ok: false, errors } : { ok: true, parts };
}

export function measureParts(input: PartColumns, onProgress?: (done: number, total: number) => void): MeasureResult {
  const steps = measurePartsStepwise(input);
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    onProgress?.(next.value.done, next.value.total);
  }
}

/** Same, pausing every `every` parts (e.g. to let a server stream progress); `pause` is supplied by the caller. */
export async function measurePartsPaced(
  input: PartColumns,
  pause: () => Promise<void>,
  onProgress?: (done: number, total: number) => void,
  every = 25
): Promise<MeasureResult> {
  const steps = measurePartsStepwise(input);
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    onProgress?.(next.value.done, next.value.total);
    if (next.value.done % every === 0) await pause();
  }
}
