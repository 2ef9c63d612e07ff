/**
 * Worker thread of the solver pool: runs `solveBlend` off the request thread, so a long search
 * never stalls other requests and both cores are used. Bundled to build/solve-worker.js by
 * scripts/build-solve-worker.mjs. Messages: { id, problem } → { id, result } | { id, error }.
 */
import { parentPort } from 'node:worker_threads';
import { solveBlend, type SolveProblem } from '../../blend/index';

parentPort?.on('message', ({ id, problem }: { id: number; problem: SolveProblem }) => {
  try {
    parentPort!.postMessage({ id, result: solveBlend(problem) });
  } catch (err) {
    const e = err as Error;
    parentPort!.postMessage({ id, error: { name: e?.name ?? 'Error', message: e?.message ?? String(err) } });
  }
});
