/**
 * Where measurement files are read: in the built app, in worker threads (build/measure-worker.js, bundled from
 * ./read-worker.ts; two at most, fewer on a one-core machine), so parsing a large lot never stalls other
 * requests; in the dev server and unit tests, in the calling thread (as the solver pool does). A copy of the
 * file's bytes is moved to the thread; progress messages feed the caller's `onProgress`; a refusal comes back
 * as the same DomainError (kind, message, line issues), so the API answers as before.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { Worker } from 'node:worker_threads';
import { config } from '../config';
import { DomainError, type ErrorKind, type Issue } from '../../errors/domain-error';
import { readAndPack, type PackedMeasurements, type ReadJob, type UploadProgress } from './read-file';

interface Pending {
  resolve: (r: PackedMeasurements) => void;
  reject: (e: Error) => void;
  onProgress?: (p: UploadProgress) => void;
}
interface Slot {
  worker: Worker;
  busy: Set<number>;
}
type WorkerError = { domain: { kind: ErrorKind; message: string; issues: Issue[]; title?: string } } | { name: string; message: string };

let slots: Slot[] | null = null;
const pending = new Map<number, Pending>();
let nextId = 1;

const workerFile = (): string => resolve(config().readWorkerFile);

/**
 * Worker threads when this module runs from the built app (or PF_READ_IN_WORKER=1) and the bundled worker
 * exists; PF_READ_IN_WORKER=0: never.
 */
export function readsInWorkers(file = workerFile()): boolean {
  const wanted = config().readInWorker ?? import.meta.url.includes('/build/server/');
  return wanted && existsSync(file);
}

/** A DomainError again from what the worker sent; anything else as a plain error naming the worker. */
export function reviveReadError(e: WorkerError): Error {
  if ('domain' in e) return new DomainError(e.domain.kind, e.domain.message, { issues: e.domain.issues, title: e.domain.title });
  return new Error(`measurement reader: ${e.message}`);
}

/** Starts one reader thread on `file` and wires its answers to the pending jobs. */
export function startReader(file: string, execArgv?: string[]): Slot {
  const worker = new Worker(file, execArgv ? { execArgv } : undefined);
  worker.unref();
  const slot: Slot = { worker, busy: new Set<number>() };
  worker.on('message', (m: { id: number; progress?: UploadProgress; result?: PackedMeasurements; error?: WorkerError }) => {
    const p = pending.get(m.id);
    if (!p) return;
    if (m.progress) return p.onProgress?.(m.progress);
    slot.busy.delete(m.id);
    pending.delete(m.id);
    if (m.error) p.reject(reviveReadError(m.error));
    else p.resolve(m.result!);
  });
  worker.on('error', (err) => {
    // A crashed reader fails the files it held (nothing was saved) and is replaced.
    for (const id of slot.busy) {
      pending.get(id)?.reject(err);
      pending.delete(id);
    }
    if (slots) slots = slots.map((s) => (s === slot ? startReader(file, execArgv) : s));
  });
  return slot;
}

/** Reads `job` on `slot`: a copy of the bytes is moved to the thread (the caller keeps the file to store it). */
export function readOn(slot: Slot, job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  const id = nextId++;
  const body = job.body.slice();
  return new Promise<PackedMeasurements>((resolvePromise, reject) => {
    pending.set(id, { resolve: resolvePromise, reject, onProgress });
    slot.busy.add(id);
    slot.worker.postMessage({ id, job: { ...job, body } }, [body.buffer as ArrayBuffer]);
  });
}

/** Reads a measurement file in a worker thread when the app is built, else here. */
export function readOffThread(job: ReadJob, onProgress?: (p: UploadProgress) => void): Promise<PackedMeasurements> {
  if (!readsInWorkers()) return readAndPack(job, onProgress);
  slots ??= Array.from({ length: Math.max(1, Math.min(2, availableParallelism())) }, () => startReader(workerFile()));
  const slot = slots.reduce((a, b) => (b.busy.size < a.busy.size ? b : a));
  return readOn(slot, job, onProgress);
}

export async function closeReadPool(): Promise<void> {
  const s = slots;
  slots = null;
  if (s) await Promise.all(s.map((x) => x.worker.terminate()));
}
