/**
 * Shared plumbing of /api/v1/measurements: the batch id from the path, the uploaded file, and
 * service refusals (quality, batches, formulations, materials) → JSON { error, issues? } with
 * their status (400/403/404/409/413/415/422).
 */
import { json } from '@sveltejs/kit';
import { ApiError, handleApi } from '../api/body';
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

/** The file of an upload: multipart field `file`, or the raw body (text/csv, text/plain) named by `x-file-name`. */
export async function uploadedFile(request: Request): Promise<MeasurementFile> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > MAX_MEASUREMENT_FILE_BYTES + 64 * 1024) throw new ApiError(413, `The upload is larger than the ${(MAX_MEASUREMENT_FILE_BYTES / 1024 / 1024).toFixed(1)} MB limit for measurement files. Nothing was saved.`);
  const type = request.headers.get('content-type') ?? '';
  if (/^multipart\/form-data/i.test(type)) {
    const file = (await request.formData()).get('file');
    if (!(file instanceof File)) throw new ApiError(400, 'Send the measurement file in the multipart field "file".');
    return { name: file.name || 'measurements.csv', contentType: file.type || 'text/plain', body: Buffer.from(await file.arrayBuffer()) };
  }
  if (/^text\/(csv|plain|tab-separated-values)\b/i.test(type)) {
    return { name: request.headers.get('x-file-name')?.slice(0, 200) || 'measurements.csv', contentType: type.split(';')[0], body: Buffer.from(await request.arrayBuffer()) };
  }
  throw new ApiError(415, 'Send the measurements as multipart/form-data (field "file") or as a text/csv or text/plain body.');
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
