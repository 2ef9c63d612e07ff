/**
 * Worker thread of the measurement readers (./read-pool.ts): reads a file (./read-file.ts) off the request
 * thread — a 100,000-row table or 2,000 spectra no longer hold up other requests. Bundled to
 * build/measure-worker.js by scripts/build-solve-worker.mjs. Messages: { id, job } → { id, progress } …
 * then { id, result } (packed: ./read-file.ts PackedMeasurements, typed arrays moved) | { id, error }
 * (a domain refusal keeps its kind, message and line issues).
 */
import { parentPort } from 'node:worker_threads';
import { DomainError } from '../../errors/domain-error';
import { readAndPack, type ReadJob } from './read-file';

parentPort?.on('message', async ({ id, job }: { id: number; job: ReadJob }) => {
  try {
    const result = await readAndPack(job, (progress) => parentPort!.postMessage({ id, progress }));
    parentPort!.postMessage({ id, result }, [result.numbers.buffer as ArrayBuffer, result.columnNo.buffer as ArrayBuffer]);
  } catch (err) {
    const e = err as Error;
    const error =
      err instanceof DomainError
        ? { domain: { kind: err.kind, message: err.message, issues: err.issues, title: err.title } }
        : { name: e?.name ?? 'Error', message: e?.message ?? String(err) };
    parentPort!.postMessage({ id, error });
  }
});
