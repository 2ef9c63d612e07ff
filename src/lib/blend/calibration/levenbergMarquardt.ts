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
 * Also returns the approximate parameter covariance s²(JᵀJ)⁻¹ at the solution
 * (s² = ‖r‖²/(m − n)) for standard errors, when m > n and JᵀJ is invertible.
 */
import { lusolve, inv } from 'mathjs';

export interface LmOptions {
  maxIterations?: number;
  /** Stop when the relative decrease of ‖r‖² falls below this. */
  tolerance?: number;
  initialDamping?: number;
  /** Stop when ‖r‖ falls below this (default 1e-15). */
  residualTolerance?: number;
  /** Largest allowed |δⱼ| per step (a simple trust region); default unlimited. */
  maxStep?: number;
}

export interface LmResult {
  params: number[];
  residuals: number[];
  /** ½‖r‖² at the solution. */
  cost: number;
  iterations: number;
  converged: boolean;
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

export function levenbergMarquardt(f: ResidualFn, p0: number[], options: LmOptions = {}): LmResult {
  const maxIt = options.maxIterations ?? 100;
  const tol = options.tolerance ?? 1e-12;
  let mu = options.initialDamping ?? 1e-3;
  let p = p0.slice();
  let r = f(p);
  let cost = sumSq(r);
  let it = 0;
  let converged = false;
  const n = p.length;
  let jtj: number[][] = [];
  for (; it < maxIt; it++) {
    const J = jacobian(f, p, r);
    jtj = Array.from({ length: n }, (_, a) =>
      Array.from({ length: n }, (_, b) => J.reduce((s, row) => s + row[a] * row[b], 0))
    );
    const jtr = Array.from({ length: n }, (_, a) => J.reduce((s, row, i) => s + row[a] * r[i], 0));
    let accepted = false;
    for (let tries = 0; tries < 12 && !accepted; tries++) {
      const A = jtj.map((row, a) => row.map((v, b) => (a === b ? v + mu * Math.max(v, 1e-12) : v)));
      const raw = (lusolve(A, jtr.map((v) => -v)) as number[][]).map((row) => row[0]);
      const big = Math.max(...raw.map(Math.abs));
      const limit = options.maxStep ?? Infinity;
      const delta = big > limit ? raw.map((v) => (v * limit) / big) : raw;
      const q = p.map((v, j) => v + delta[j]);
      const rq = f(q);
      const cq = sumSq(rq);
      if (Number.isFinite(cq) && cq < cost) {
        const rel = (cost - cq) / Math.max(cost, 1e-300);
        p = q;
        r = rq;
        cost = cq;
        mu = Math.max(mu / 3, 1e-12);
        accepted = true;
        if (rel < tol) converged = true;
      } else {
        mu *= 4;
      }
    }
    if (!accepted || converged || Math.sqrt(cost) < (options.residualTolerance ?? 1e-15)) {
      converged = true;
      break;
    }
  }
  return { params: p, residuals: r, cost: cost / 2, iterations: it, converged, standardErrors: stdErrors(jtj, cost, r.length) };
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
