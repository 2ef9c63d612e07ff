/**
 * Worker thread of the solver pool: runs the solver (`solveAtCondition`; `solveBlend` at the bench)
 * off the request thread, so a long search
 * never stalls other requests and both cores are used. Bundled to build/solve-worker.js by
 * scripts/build-solve-worker.mjs. Messages: { id, problem } → { id, result } | { id, error }.
 */
import { parentPort } from 'node:worker_threads';
import { solveAtCondition, type ConditionSolveProblem } from '../../blend/solver/solveAtCondition';

parentPort?.on('message', ({ id, problem }: { id: number; problem: ConditionSolveProblem }) => {
  try {
    parentPort!.postMessage({ id, result: solveAtCondition(problem) });
  } catch (err) {
    const e = err as Error;
    parentPort!.postMessage({ id, error: { name: e?.name ?? 'Error', message: e?.message ?? String(err) } });
  }
});
