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
import { config } from '../config';
import { BlendInputError } from '../../blend/errors';
import { solveAtCondition, type ConditionSolveProblem, type ConditionSolveResult } from '../../blend/solver/solveAtCondition';
import { traceTradeOff, type TradeOffProblem, type TradeOffResult } from '../../blend/solver/tradeOff';
import { SpectrumInputError } from '../../spectral/errors';
import { runsFromBuild, ThreadPool } from '../workers/thread-pool';

const workerFile = (): string => resolve(config().solveWorkerFile);

let pool: ThreadPool<unknown> | null = null;

function revive(error: { name: string; message: string }): Error {
  if (['BlendInputError', 'ThermalRangeError', 'ThermalNotCharacterisedError'].includes(error.name))
    return new BlendInputError(error.message);
  if (error.name === 'SpectrumInputError') return new SpectrumInputError(error.message);
  return new Error(`solver worker: ${error.message}`);
}

/** Starts the workers ahead of the first request (they load the solver and mathjs, about 1–2 s). */
export function warmSolverPool(): void {
  if (!usesWorkers()) return;
  pool ??= new ThreadPool(workerFile(), workerCount(), revive);
  pool.warm();
}

/** The configured number (PF_SOLVE_WORKERS, validated in config) when set, else one per core (at most 4). */
export function workerCount(setting: number | null = config().solveWorkers): number {
  return setting ?? Math.max(1, Math.min(4, availableParallelism()));
}

/** Workers only when this module runs from the built app (build/server/…); dev server and tests solve in-thread. */
export function usesWorkers(): boolean {
  return runsFromBuild() && workerCount() > 0 && existsSync(workerFile());
}

/** Sends one job to the least busy worker. */
function post<R>(message: { kind: 'solve' | 'tradeOff'; problem: unknown }): Promise<R> {
  warmSolverPool();
  return pool!.run(message) as Promise<R>;
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
  const p = pool;
  pool = null;
  await p?.close();
}
