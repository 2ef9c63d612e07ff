/** Shared plumbing of /api/v1/measurements: the uploaded file and the streamed (NDJSON) answer. */
import { readUploadedFile } from '../api/upload';
import { errorAnswer } from '../http/api-handler';
import { MAX_MEASUREMENT_FILE_BYTES, MAX_TABLE_FILE_BYTES } from '../../measurements/schema';
import type { MeasurementFile } from './upload';

/**
 * The file of a measurement upload (see readUploadedFile: multipart `file`, or a text/csv body named by
 * `x-file-name`); a tester table may be larger.
 */
export function uploadedFile(request: Request, table = false): Promise<MeasurementFile> {
  return table
    ? readUploadedFile(request, { maxBytes: MAX_TABLE_FILE_BYTES, what: 'tester table', defaultName: 'tester-table.csv', gzip: true })
    : readUploadedFile(request, { maxBytes: MAX_MEASUREMENT_FILE_BYTES, what: 'measurement', defaultName: 'measurements.csv', gzip: true });
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
        const { status, body } = errorAnswer(err);
        write({ type: 'error', status, ...(status === 500 ? { error: 'The upload failed on the server; nothing was saved.' } : body) });
      }
      controller.close();
    }
  });
  return new Response(stream, {
    status: 200,
    headers: { 'content-type': 'application/x-ndjson; charset=utf-8', 'cache-control': 'no-cache', 'x-accel-buffering': 'no' }
  });
}
