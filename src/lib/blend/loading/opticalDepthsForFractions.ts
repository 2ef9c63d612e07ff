/**
 * Inverse of the photon budget in optical depth: τᵢ (at the pump reference) that give
 * wanted output fractions (pump leak first). The path length and the dispense geometry do
 * not enter here; wt % follow from τ in `concentrationsForFractions`, so the answer scales
 * exactly as 1/L.
 *
 * Method:
 * 1. Split: in the optically thin limit wᵢ ∝ τᵢ·IQEᵢ·λ̄_pump/λ̄ᵢ (Beer–Lambert to first order,
 *    Stokes loss per photon; Schubert, *Light-Emitting Diodes*, 2nd ed. 2006), so the start
 *    direction is dᵢ = wᵢ/(IQEᵢ·λ̄_pump/λ̄ᵢ).
 * 2. Total: the pump leak w₀(s·d) falls monotonically with the scale s (Beer–Lambert
 *    T = exp(−Στ) weighted over the pump spectrum), so s is bracketed and found by the
 *    Illinois variant of regula falsi (Dowell & Jarratt, BIT 11 (1971) 168) on logit w₀.
 * 3. Newton's method with backtracking (Dennis & Schnabel, *Numerical Methods for
 *    Unconstrained Optimization and Nonlinear Equations*, 1983, §6.3) on
 *    Rᵢ = ln(wᵢ/w₀) − ln(ŵᵢ/ŵ₀) in uᵢ = ln τᵢ, which is near the identity when thin and stays
 *    monotone when thick. Forward-difference Jacobian.
 * A phosphor wanted at w = 0 gets τ = 0. A mix with no pump leak needs an infinite layer.
 */
import { centroidNm } from '../grid';
import { type LoadingBasis, type LoadingResult, photonBudgetForDepths } from './beerLambertPhotonBudget';
import { budgetFractionsForDepths } from './budgetFractions';

/** Fractions below this are treated as "not used" (τ = 0). */
const ACTIVE_MIN = 1e-12;
/** Largest ln τ tried: τ = 500 leaves e^−500 of the pump, far below any wanted leak. */
const MAX_U = Math.log(500);
const MIN_U = Math.log(1e-12);
const FD_STEP = 1e-6;
const RESIDUAL_TOL = 1e-11;

export interface DepthSolution {
  /** τᵢ at the pump reference, one per phosphor. */
  opticalDepths: number[];
  result: LoadingResult;
  /** Max |wᵢ(τ) − ŵᵢ| over all fractions. */
  maxFractionError: number;
  converged: boolean;
  /** Forward evaluations used. */
  evaluations: number;
}

const logit = (w: number) => Math.log(w / (1 - w));

export function opticalDepthsForFractions(basis: LoadingBasis, wanted: number[], cascade = false, cascadePathFactor = 1): DepthSolution {
  const n = basis.emission.length;
  let evaluations = 0;
  const run = (tau: number[]) => (evaluations++, budgetFractionsForDepths(basis, tau, cascade, cascadePathFactor));
  const finish = (tau: number[]): DepthSolution => {
    const result = photonBudgetForDepths(basis, tau, cascade, cascadePathFactor);
    const err = Math.max(...result.opticalFractions.map((f, i) => Math.abs(f - wanted[i])));
    return { opticalDepths: tau, result, maxFractionError: err, converged: err < 1e-7, evaluations };
  };
  const active = Array.from({ length: n }, (_, i) => wanted[i + 1] > ACTIVE_MIN);
  const idx = active.flatMap((a, i) => (a ? [i] : []));
  const w0 = wanted[0];
  if (idx.length === 0) return finish(new Array(n).fill(0));
  const pumpCentroid = centroidNm(basis.pump);
  const dir = basis.emission.map((e, i) => (active[i] ? wanted[i + 1] / (basis.iqe[i] * (pumpCentroid / centroidNm(e))) : 0));
  const tauAt = (u: number[]) => {
    const tau = new Array(n).fill(0);
    idx.forEach((i, k) => (tau[i] = Math.exp(Math.min(MAX_U, Math.max(MIN_U, u[k])))));
    return tau;
  };
  // 2. total: h(ln s) = logit w₀(s·d) − logit ŵ₀, decreasing in ln s.
  const dirSum = idx.reduce((s, i) => s + dir[i], 0);
  const uDir = idx.map((i) => Math.log(dir[i] / dirSum));
  if (!(w0 > 0)) return finish(tauAt(uDir.map((v) => v + MAX_U)));
  const h = (lnS: number) => logit(Math.min(1 - 1e-300, Math.max(1e-300, run(tauAt(uDir.map((v) => v + lnS)))[0]))) - logit(w0);
  let lo = Math.log(dirSum / w0) - 1;
  let hLo = h(lo);
  while (hLo < 0 && lo > MIN_U) hLo = h((lo -= 3));
  let hi = lo + 2;
  let hHi = h(hi);
  while (hHi > 0 && hi < MAX_U) hHi = h((hi += 2));
  let lnS = hi;
  for (let it = 0, side = 0; it < 60 && hLo > 0 && hHi < 0; it++) {
    lnS = (lo * hHi - hi * hLo) / (hHi - hLo);
    const hm = h(lnS);
    if (Math.abs(hm) < 1e-4) break;
    if (hm > 0) {
      lo = lnS;
      hLo = hm;
      if (side === 1) hHi /= 2;
      side = 1;
    } else {
      hi = lnS;
      hHi = hm;
      if (side === -1) hLo /= 2;
      side = -1;
    }
  }
  // 3. Newton on log-ratios.
  const target = idx.map((i) => Math.log(wanted[i + 1] / w0));
  const residual = (f: number[]) => idx.map((i, k) => Math.log(f[i + 1] / f[0]) - target[k]);
  const norm = (r: number[]) => Math.max(...r.map(Math.abs));
  const jacobianAt = (u0: number[], r0: number[]): number[][] => {
    const jac = idx.map(() => new Array(idx.length).fill(0));
    for (let k = 0; k < idx.length; k++) {
      const up = u0.slice();
      up[k] += FD_STEP;
      const rk = residual(run(tauAt(up)));
      for (let m = 0; m < idx.length; m++) jac[m][k] = (rk[m] - r0[m]) / FD_STEP;
    }
    return jac;
  };
  let u = uDir.map((v) => v + lnS);
  let r = residual(run(tauAt(u)));
  let jac: number[][] | null = null;
  for (let it = 0; it < 50 && norm(r) > RESIDUAL_TOL; it++) {
    jac ??= jacobianAt(u, r);
    const step = solveSmallSystem(
      jac,
      r.map((v) => -v)
    );
    if (!step) break;
    const big = Math.max(...step.map(Math.abs));
    let scale = big > 3 ? 3 / big : 1;
    let accepted = false;
    for (let b = 0; b < 30; b++, scale /= 2) {
      const uTry = u.map((v, k) => Math.min(MAX_U, Math.max(MIN_U, v + scale * step[k])));
      const rTry = residual(run(tauAt(uTry)));
      if (rTry.every(Number.isFinite) && norm(rTry) < norm(r)) {
        // Chord steps (Jacobian kept) while they gain a factor 10; a fresh Jacobian otherwise.
        if (!(scale === 1 && norm(rTry) < 0.1 * norm(r))) jac = null;
        u = uTry;
        r = rTry;
        accepted = true;
        break;
      }
    }
    if (!accepted) {
      if (jac === null) break;
      jac = null;
    }
  }
  return finish(tauAt(u));
}

/** Gaussian elimination with partial pivoting for the small (≤ 5×5) Newton systems; null if singular. */
function solveSmallSystem(a: number[][], b: number[]): number[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let col = 0; col < n; col++) {
    let p = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[p][col])) p = r;
    if (!(Math.abs(m[p][col]) > 1e-300)) return null;
    [m[col], m[p]] = [m[p], m[col]];
    for (let r = col + 1; r < n; r++) {
      const f = m[r][col] / m[col][col];
      for (let c = col; c <= n; c++) m[r][c] -= f * m[col][c];
    }
  }
  const x = new Array(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = m[r][n];
    for (let c = r + 1; c < n; c++) s -= m[r][c] * x[c];
    x[r] = s / m[r][r];
  }
  return x;
}
