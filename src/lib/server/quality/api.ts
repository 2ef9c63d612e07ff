/**
 * Shared plumbing of /api/v1/measurements: the batch id from the path, the uploaded file, and
 * service refusals (quality, batches, formulations, materials) → JSON { error, issues? } with
 * their status (400/403/404/409/413/415/422).
 */
import { json } from '@sveltejs/kit';
import { ApiError, handleApi } from '../api/body';
import { readUploadedFile } from '../api/upload';
import { BatchError } from '../batches/errors';
import { FormulationError } from '../formulations/errors';
import { MaterialError } from '../materials/errors';
import { MAX_MEASUREMENT_FILE_BYTES } from '../../schemas/quality';
import { QualityError } from './errors';
import type { MeasurementFile } from './upload';

export function batchIdParam(value: string | undefined): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) throw new ApiError(404, `Batch ${value} was not found.`);
  return id;
}

/** A service refusal as { status, error, issues }, or null for anything else. */
export function refusalOf(err: unknown): { status: number; error: string; issues?: unknown[] } | null {
  if (err instanceof QualityError) return { status: err.status, error: err.message, ...(err.issues.length ? { issues: err.issues } : {}) };
  if (err instanceof BatchError) return { status: err.status, error: err.message, ...(err.issues.length ? { issues: err.issues } : {}) };
  if (err instanceof FormulationError) return { status: err.status, error: err.message };
  if (err instanceof MaterialError) return { status: err.status, error: err.message };
  return null;
}

export function qualityApi(run: () => Promise<Response>): Promise<Response> {
  return handleApi(async () => {
    try {
      return await run();
    } catch (err) {
      const r = refusalOf(err);
      if (r) return json({ error: r.error, ...(r.issues ? { issues: r.issues } : {}) }, { status: r.status });
      throw err;
    }
  });
}

/** The file of a measurement upload (see readUploadedFile: multipart `file`, or a text/csv body named by `x-file-name`). */
export function uploadedFile(request: Request): Promise<MeasurementFile> {
  return readUploadedFile(request, { maxBytes: MAX_MEASUREMENT_FILE_BYTES, what: 'measurement', defaultName: 'measurements.csv' });
}

/** Newline-delimited JSON stream: progress lines from `run`, then one `done` or `error` line. */
export function ndjsonStream(run: (write: (line: Record<string, unknown>) => void) => Promise<Record<string, unknown>>): Response {
  const encoder = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const write = (line: Record<string, unknown>) => controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
      try {
        write({ type: 'done', status: 201, result: await run(write) });
      } catch (err) {
        const r = refusalOf(err);
        if (!r) console.error('[phosforge] measurement upload failed:', err);
        write({ type: 'error', ...(r ?? { status: 500, error: 'The upload failed on the server; nothing was saved.' }) });
      }
      controller.close();
    }
  });
  return new Response(stream, { status: 200, headers: { 'content-type': 'application/x-ndjson; charset=utf-8', 'cache-control': 'no-cache', 'x-accel-buffering': 'no' } });
}
