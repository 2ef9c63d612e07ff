/** Sends a blend problem to the solver API from the browser (POST /api/v1/solve, /api/v1/solve/trade-off); cancellable. */
import type { SolveProblemInput } from '$lib/blend';
import type { ConditionSolveResult as SolveResult } from '$lib/blend/solver/solveAtCondition';

export type Outcome<T> = { ok: true; result: T } | { ok: false; error: string; aborted: boolean };
export type SolveOutcome = Outcome<SolveResult>;

/** POSTs a JSON body to a solver route; the API's own error message, or a plain one when it cannot be reached. */
export async function postToSolver<T>(url: string, body: unknown, signal: AbortSignal): Promise<Outcome<T>> {
  try {
    const res = await fetch(url, {
      method: 'POST',
      headers: { 'content-type': 'application/json', accept: 'application/json' },
      body: JSON.stringify(body),
      signal
    });
    const answer = await res.json().catch(() => null);
    if (!res.ok) return { ok: false, error: answer?.error ?? `The solver answered ${res.status}.`, aborted: false };
    return { ok: true, result: answer as T };
  } catch (err) {
    const aborted = err instanceof DOMException && err.name === 'AbortError';
    return {
      ok: false,
      error: aborted ? 'Search stopped.' : 'The solver could not be reached. Check the connection and try again.',
      aborted
    };
  }
}

export function requestSolve(problem: SolveProblemInput, signal: AbortSignal): Promise<SolveOutcome> {
  return postToSolver<SolveResult>('/api/v1/solve', problem, signal);
}
