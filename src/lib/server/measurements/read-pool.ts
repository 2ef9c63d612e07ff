/**
 * Where measurement files are read: in the built app, in worker threads (build/measure-worker.js, bundled from
 * ./read-worker.ts; two at most, fewer on a one-core machine — ../workers/thread-pool.ts), so parsing a large
 * lot never stalls other requests; in the dev server and unit tests, in the calling thread (as the solver
 * does). A copy of the file's bytes is moved to the thread; progress messages feed the caller's `onProgress`;
 * a refusal comes back as the same DomainError (kind, message, line issues), so the API answers as before.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { config } from '../config';
import { DomainError, type ErrorKind, type Issue } from '../../errors/domain-error';
import { runsFromBuild, ThreadPool } from '../workers/thread-pool';
import { readAndPack, type PackedMeasurements, type ReadJob, type UploadProgress } from './read-file';

type WorkerError = { domain: { kind: ErrorKind; message: string; issues: Issue[]; title?: string } } | { name: string; message: string };
export type ReaderPool = ThreadPool<PackedMeasurements, WorkerError>;

let pool: ReaderPool | null = null;

const workerFile = (): string => resolve(config().readWorkerFile);

/**
 * Worker threads when this module runs from the built app (or PF_READ_IN_WORKER=1) and the bundled worker
 * exists; PF_READ_IN_WORKER=0: never.
 */
export function readsInWorkers(): boolean {
  return (config().readInWorker ?? runsFromBuild()) && existsSync(workerFile());
}

/** A DomainError again from what the worker sent; anything else as a plain error naming the worker. */
export function reviveReadError(e: WorkerError): Error {
  if ('domain' in e) return new DomainError(e.domain.kind, e.domain.message, { issues: e.domain.issues, title: e.domain.title });
  return new Error(`measurement reader: ${e.message}`);
}

/** A pool of `size` reader threads on the bundled reader `file`. */
export function readerPool(file: string, size: number): ReaderPool {
  return new ThreadPool(file, size, reviveReadError);
}

/** Reads `job` on `readers`: a copy of the bytes is moved to the thread (the caller keeps the file to store it). */
export function readOn(readers: ReaderPool, job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  const body = job.body.slice();
  return readers.run({ job: { ...job, body } }, [body.buffer as ArrayBuffer], onProgress);
}

/** Reads a measurement file in a worker thread when the app is built, else here. */
export function readOffThread(job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  if (!readsInWorkers()) return readAndPack(job, onProgress);
  pool ??= readerPool(workerFile(), Math.min(2, availableParallelism()));
  return readOn(pool, job, onProgress);
}

export async function closeReadPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.close();
}
