/**
 * A small pool of worker threads for the blend solver (one per core, at most 4; PF_SOLVE_WORKERS=N
 * sets the number) in the built app, which bundles the worker to build/solve-worker.js; in the dev
 * server and unit tests the solver runs in the calling thread (PF_SOLVE_WORKERS=0 forces that in
 * the built app too). Input errors keep their type across the thread boundary, so the API still
 * answers 422 for them.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { Worker } from 'node:worker_threads';
import { config } from '../config';
import { BlendInputError } from '../../blend/errors';
import { solveAtCondition, type ConditionSolveProblem, type ConditionSolveResult } from '../../blend/solver/solveAtCondition';
import { traceTradeOff, type TradeOffProblem, type TradeOffResult } from '../../blend/solver/tradeOff';
import { SpectrumInputError } from '../../spectral/errors';

const workerFile = (): string => resolve(config().solveWorkerFile);

interface Slot {
  worker: Worker;
  busy: Set<number>;
}
type Pending = { resolve: (r: never) => void; reject: (e: Error) => void };

let slots: Slot[] | null = null;
const pending = new Map<number, Pending>();
let nextId = 1;

function revive(error: { name: string; message: string }): Error {
  if (['BlendInputError', 'ThermalRangeError', 'ThermalNotCharacterisedError'].includes(error.name))
    return new BlendInputError(error.message);
  if (error.name === 'SpectrumInputError') return new SpectrumInputError(error.message);
  return new Error(`solver worker: ${error.message}`);
}

function startSlot(): Slot {
  const worker = new Worker(workerFile());
  worker.unref();
  const slot: Slot = { worker, busy: new Set<number>() };
  worker.on('message', (m: { id: number; result?: unknown; error?: { name: string; message: string } }) => {
    slot.busy.delete(m.id);
    const p = pending.get(m.id);
    pending.delete(m.id);
    if (!p) return;
    if (m.error) p.reject(revive(m.error));
    else p.resolve(m.result as never);
  });
  worker.on('error', (err) => {
    // A crashed worker fails the requests it held and is replaced by a fresh one.
    for (const id of slot.busy) {
      pending.get(id)?.reject(err);
      pending.delete(id);
    }
    if (slots) slots = slots.map((s) => (s === slot ? startSlot() : s));
  });
  return slot;
}

/** Starts the workers ahead of the first request (they load the solver and mathjs, about 1–2 s). */
export function warmSolverPool(): void {
  if (usesWorkers()) slots ??= Array.from({ length: workerCount() }, startSlot);
}

/** The configured number (PF_SOLVE_WORKERS, validated in config) when set, else one per core (at most 4). */
export function workerCount(setting: number | null = config().solveWorkers): number {
  return setting ?? Math.max(1, Math.min(4, availableParallelism()));
}

/** Workers only when this module runs from the built app (build/server/…); dev server and tests solve in-thread. */
export function usesWorkers(): boolean {
  const built = import.meta.url.includes('/build/server/');
  return built && workerCount() > 0 && existsSync(workerFile());
}

/** Sends one job to the least busy worker. */
function post<R>(message: { kind: 'solve' | 'tradeOff'; problem: unknown }): Promise<R> {
  warmSolverPool();
  const slot = slots!.reduce((a, b) => (b.busy.size < a.busy.size ? b : a));
  const id = nextId++;
  return new Promise<R>((resolvePromise, reject) => {
    pending.set(id, { resolve: resolvePromise as (r: never) => void, reject });
    slot.busy.add(id);
    slot.worker.postMessage({ id, ...message });
  });
}

/** Solves (at the problem's condition; bench when none) in a worker thread when the bundled worker exists, else in this thread. */
export function solveOffThread(problem: ConditionSolveProblem): Promise<ConditionSolveResult> {
  if (!usesWorkers()) return Promise.resolve().then(() => solveAtCondition(problem));
  return post<ConditionSolveResult>({ kind: 'solve', problem });
}

/** Traces an LER trade-off front in a worker thread (in this thread where there are no workers). */
export function tradeOffOffThread(problem: TradeOffProblem): Promise<TradeOffResult> {
  if (!usesWorkers()) return Promise.resolve().then(() => traceTradeOff(problem));
  return post<TradeOffResult>({ kind: 'tradeOff', problem });
}

export async function closeSolverPool(): Promise<void> {
  const s = slots;
  slots = null;
  if (s) await Promise.all(s.map((x) => x.worker.terminate()));
}
