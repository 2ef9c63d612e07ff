/**
 * Worker thread of the solver pool: runs the solver (`solveAtCondition`; `solveBlend` at the bench)
 * off the request thread, so a long search
 * never stalls other requests and both cores are used. Bundled to build/solve-worker.js by
 * scripts/build-solve-worker.mjs. Messages: { id, kind: 'solve' | 'tradeOff', problem } → { id, result } | { id, error }.
 */
import { parentPort } from 'node:worker_threads';
import { solveAtCondition, type ConditionSolveProblem } from '../../blend/solver/solveAtCondition';
import { traceTradeOff, type TradeOffProblem } from '../../blend/solver/tradeOff';

type Job = { id: number; kind: 'solve'; problem: ConditionSolveProblem } | { id: number; kind: 'tradeOff'; problem: TradeOffProblem };

parentPort?.on('message', (job: Job) => {
  const { id } = job;
  try {
    const result = job.kind === 'tradeOff' ? traceTradeOff(job.problem) : solveAtCondition(job.problem);
    parentPort!.postMessage({ id, result });
  } catch (err) {
    const e = err as Error;
    parentPort!.postMessage({ id, error: { name: e?.name ?? 'Error', message: e?.message ?? String(err) } });
  }
});
