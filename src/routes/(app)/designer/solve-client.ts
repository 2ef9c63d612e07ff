/** Sends a blend problem to POST /api/v1/solve from the browser; cancellable. */
import type { SolveProblemInput } from '$lib/blend';
import type { ConditionSolveResult as SolveResult } from '$lib/blend/solver/solveAtCondition';

export type SolveOutcome = { ok: true; result: SolveResult } | { ok: false; error: string; aborted: boolean };

export async function requestSolve(problem: SolveProblemInput, signal: AbortSignal): Promise<SolveOutcome> {
  try {
    const res = await fetch('/api/v1/solve', {
      method: 'POST',
      headers: { 'content-type': 'application/json', accept: 'application/json' },
      body: JSON.stringify(problem),
      signal
    });
    const body = await res.json().catch(() => null);
    if (!res.ok) return { ok: false, error: body?.error ?? `The solver answered ${res.status}.`, aborted: false };
    return { ok: true, result: body as SolveResult };
  } catch (err) {
    const aborted = err instanceof DOMException && err.name === 'AbortError';
    return {
      ok: false,
      error: aborted ? 'Search stopped.' : 'The solver could not be reached. Check the connection and try again.',
      aborted
    };
  }
}
