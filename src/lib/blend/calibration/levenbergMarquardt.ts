/**
 * Levenberg–Marquardt non-linear least squares: minimise ½‖r(p)‖².
 *
 * K. Levenberg, "A method for the solution of certain non-linear problems in least
 * squares", Q. Appl. Math. 2 (1944) 164–168; D. W. Marquardt, "An algorithm for
 * least-squares estimation of nonlinear parameters", J. SIAM 11 (1963) 431–441.
 * Step (Marquardt's scaling): (JᵀJ + μ·diag(JᵀJ)) δ = −Jᵀr; μ is divided by 3 after an
 * accepted step and multiplied by 4 after a rejected one (a common practice schedule).
 * The Jacobian is by forward differences (relative step 1e-6). Linear algebra: mathjs.
 *
 * Stopping tests after J. J. Moré, "The Levenberg–Marquardt algorithm: implementation and
 * theory", Numerical Analysis, Lecture Notes in Mathematics 630 (1978) 105–116 (MINPACK's
 * ftol / xtol / gtol): `converged` is true only when one of them is met —
 *   'small error decrease'  relative decrease of ‖r‖² after an accepted step < tolerance,
 *   'small step'            ‖δ‖∞ ≤ stepTolerance·(‖p‖∞ + stepTolerance),
 *   'small gradient'        maxⱼ |Jⱼᵀr| / (‖Jⱼ‖‖r‖) ≤ gradientTolerance (r ⟂ every column),
 *   'residual below tolerance'.
 * Otherwise `converged` is false and `reason` says why it stopped: 'max iterations',
 * 'no step reduces the error' (12 damped tries all failed away from a stationary point),
 * 'singular Jacobian' (a parameter does not change the residuals, or the system cannot be
 * solved), 'non-finite residual'.
 *
 * Also returns the approximate parameter covariance s²(JᵀJ)⁻¹ at the solution
 * (s² = ‖r‖²/(m − n)) for standard errors, when m > n and JᵀJ is invertible.
 */
import { lusolve, inv } from 'mathjs';

export interface LmOptions {
  maxIterations?: number;
  /** Stop when the relative decrease of ‖r‖² after an accepted step falls below this. */
  tolerance?: number;
  initialDamping?: number;
  /** Stop when ‖r‖ falls below this (default 1e-15). */
  residualTolerance?: number;
  /** Largest allowed |δⱼ| per step (a simple trust region); default unlimited. */
  maxStep?: number;
  /** Step-size test (default 1e-10). */
  stepTolerance?: number;
  /** Gradient (orthogonality) test (default 1e-10). */
  gradientTolerance?: number;
}

export type LmStopReason =
  | 'small error decrease'
  | 'small step'
  | 'small gradient'
  | 'residual below tolerance'
  | 'max iterations'
  | 'no step reduces the error'
  | 'singular Jacobian'
  | 'non-finite residual';

export interface LmResult {
  params: number[];
  residuals: number[];
  /** ½‖r‖² at the solution. */
  cost: number;
  iterations: number;
  /** True only when a stopping test was met (see `reason`). */
  converged: boolean;
  reason: LmStopReason;
  /** Standard errors of the parameters (NaN when not estimable). */
  standardErrors: number[];
}

type ResidualFn = (p: number[]) => number[];

function jacobian(f: ResidualFn, p: number[], r0: number[]): number[][] {
  const m = r0.length;
  const cols = p.map((pi, j) => {
    const h = 1e-6 * Math.max(1, Math.abs(pi));
    const q = p.slice();
    q[j] = pi + h;
    const r = f(q);
    return r0.map((v, i) => (r[i] - v) / h);
  });
  return Array.from({ length: m }, (_, i) => cols.map((c) => c[i]));
}

const sumSq = (r: number[]): number => r.reduce((s, v) => s + v * v, 0);
const CONVERGED_REASONS: readonly LmStopReason[] = ['small error decrease', 'small step', 'small gradient', 'residual below tolerance'];

/** Moré (1978) gtol: the largest cosine between r and a Jacobian column. */
function gradientCosine(jtj: number[][], jtr: number[], cost: number): number {
  const rNorm = Math.sqrt(cost);
  if (rNorm === 0) return 0;
  return Math.max(0, ...jtr.map((g, j) => (jtj[j][j] > 0 ? Math.abs(g) / (Math.sqrt(jtj[j][j]) * rNorm) : 0)));
}

function solveStep(jtj: number[][], jtr: number[], mu: number): number[] | null {
  const A = jtj.map((row, a) => row.map((v, b) => (a === b ? v + mu * Math.max(v, 1e-12) : v)));
  try {
    const raw = (
      lusolve(
        A,
        jtr.map((v) => -v)
      ) as number[][]
    ).map((row) => row[0]);
    return raw.every(Number.isFinite) ? raw : null;
  } catch {
    return null;
  }
}

export function levenbergMarquardt(f: ResidualFn, p0: number[], options: LmOptions = {}): LmResult {
  const maxIt = options.maxIterations ?? 100;
  const tol = options.tolerance ?? 1e-12;
  const xtol = options.stepTolerance ?? 1e-10;
  const gtol = options.gradientTolerance ?? 1e-10;
  const rtol = options.residualTolerance ?? 1e-15;
  const limit = options.maxStep ?? Infinity;
  let mu = options.initialDamping ?? 1e-3;
  let p = p0.slice();
  let r = f(p);
  let cost = sumSq(r);
  let it = 0;
  let reason: LmStopReason = 'max iterations';
  const n = p.length;
  let jtj: number[][] = [];
  const finish = (why: LmStopReason): LmResult => ({
    params: p,
    residuals: r,
    cost: cost / 2,
    iterations: it,
    converged: CONVERGED_REASONS.includes(why),
    reason: why,
    standardErrors: jtj.length ? stdErrors(jtj, cost, r.length) : new Array<number>(n).fill(NaN)
  });
  if (!Number.isFinite(cost)) return finish('non-finite residual');
  if (Math.sqrt(cost) < rtol) return finish('residual below tolerance');
  for (; it < maxIt; it++) {
    const J = jacobian(f, p, r);
    jtj = Array.from({ length: n }, (_, a) => Array.from({ length: n }, (_, b) => J.reduce((s, row) => s + row[a] * row[b], 0)));
    const jtr = Array.from({ length: n }, (_, a) => J.reduce((s, row, i) => s + row[a] * r[i], 0));
    if (!jtj.every((row) => row.every(Number.isFinite))) return finish('non-finite residual');
    if (jtj.some((row, j) => !(row[j] > 0))) return finish('singular Jacobian');
    if (gradientCosine(jtj, jtr, cost) <= gtol) return finish('small gradient');
    let accepted = false;
    let solvable = false;
    for (let tries = 0; tries < 12 && !accepted; tries++) {
      const raw = solveStep(jtj, jtr, mu);
      if (!raw) {
        mu *= 4;
        continue;
      }
      solvable = true;
      const big = Math.max(...raw.map(Math.abs));
      const delta = big > limit ? raw.map((v) => (v * limit) / big) : raw;
      const q = p.map((v, j) => v + delta[j]);
      const rq = f(q);
      const cq = sumSq(rq);
      if (Number.isFinite(cq) && cq < cost) {
        const rel = (cost - cq) / Math.max(cost, 1e-300);
        const stepSize = Math.max(...delta.map(Math.abs));
        const size = Math.max(...p.map(Math.abs));
        p = q;
        r = rq;
        cost = cq;
        mu = Math.max(mu / 3, 1e-12);
        accepted = true;
        if (Math.sqrt(cost) < rtol) reason = 'residual below tolerance';
        else if (rel < tol) reason = 'small error decrease';
        else if (stepSize <= xtol * (size + xtol)) reason = 'small step';
      } else {
        mu *= 4;
      }
    }
    if (!solvable) return finish('singular Jacobian');
    if (!accepted) return finish('no step reduces the error');
    if (CONVERGED_REASONS.includes(reason)) {
      it++;
      return finish(reason);
    }
  }
  return finish('max iterations');
}

function stdErrors(jtj: number[][], cost: number, m: number): number[] {
  const n = jtj.length;
  if (m <= n || n === 0) return new Array<number>(n).fill(NaN);
  try {
    const cov = inv(jtj) as number[][];
    const s2 = cost / (m - n);
    return cov.map((row, i) => Math.sqrt(Math.max(0, row[i] * s2)));
  } catch {
    return new Array<number>(n).fill(NaN);
  }
}
