/**
 * Realises a designed mix as a recipe in wt % whose loading-model spectrum (with
 * first-order re-absorption) sits on the wanted colour point, so the light that is scored
 * is the light of the wt % handed over.
 *
 * 1. Start: optical depths of the mix (exact inverse in τ, `opticalDepthsForFractions`), read
 *    as superposition fractions (no re-absorption) or, from a search on the loading model
 *    (`refineOnLoadingModel`), as its output fractions with re-absorption.
 * 2. Colour: re-absorption reshapes the escaping emission (Beer–Lambert on the way out), so
 *    the chromaticity moves. Gauss–Newton, minimum-norm steps (Δu = Jᵀ(JJᵀ)⁻¹Δxy; Björck,
 *    *Numerical Methods for Least Squares Problems*, SIAM 1996, §1.1.5 for the minimum-norm
 *    solution of an underdetermined system) in uᵢ = ln τᵢ on CIE 1931 (x, y) of the
 *    loading-model SPD (CIE 15:2004 §7), Jacobian by forward differences, until
 *    |Δxy| < 1e-7 — far inside 0.5 SDCM step (≈ 1e-3 in x, y).
 * 3. wt % from τ by the path length and the dispense geometry.
 */
import { tristimulus, type Basis } from '../basis';
import { type LoadingResult, photonBudgetForDepths } from '../loading/beerLambertPhotonBudget';
import { wtPctForDepths } from '../loading/concentrationsForFractions';
import { opticalDepthsForFractions } from '../loading/opticalDepthsForFractions';
import type { LoadingParams } from '../types';

const XY_TOL = 1e-7;
const FD_STEP = 1e-6;

export type Realisation =
  { ok: true; concentrationsWtPct: number[]; opticalDepths: number[]; result: LoadingResult } | { ok: false; reason: string };

const xyOf = (spd: Float64Array): [number, number] => {
  const [X, Y, Z] = tristimulus(spd);
  const s = X + Y + Z;
  return [X / s, Y / s];
};

export function realiseOnLoadingModel(
  basis: Basis,
  loading: LoadingParams,
  fractions: number[],
  xy: [number, number],
  fractionsOnLoadingModel = false
): Realisation {
  const lb = basis.loading;
  if (!lb) return { ok: false, reason: 'A phosphor lacks an absorption coefficient.' };
  const L = loading.pathLengthMm;
  const cascade = loading.cascade ?? false;
  const kappa = loading.cascadePathFactor ?? 1;
  const start = opticalDepthsForFractions(lb, fractions, fractionsOnLoadingModel && cascade, kappa);
  if (!start.converged) return { ok: false, reason: `The loading model cannot produce this mix at ${L} mm.` };
  const idx = start.opticalDepths.flatMap((t, i) => (t > 0 ? [i] : []));
  const tauAt = (u: number[]) => {
    const tau = new Array(lb.emission.length).fill(0);
    idx.forEach((i, k) => (tau[i] = Math.exp(u[k])));
    return tau;
  };
  let u = idx.map((i) => Math.log(start.opticalDepths[i]));
  let result = photonBudgetForDepths(lb, tauAt(u), cascade, kappa);
  let err = diff(xy, xyOf(result.spd));
  for (let it = 0; it < 12 && Math.hypot(...err) > XY_TOL && idx.length > 0; it++) {
    const cur = xyOf(result.spd);
    const jac = idx.map((_, k) => {
      const up = u.slice();
      up[k] += FD_STEP;
      const p = xyOf(photonBudgetForDepths(lb, tauAt(up), cascade, kappa).spd);
      return [(p[0] - cur[0]) / FD_STEP, (p[1] - cur[1]) / FD_STEP];
    });
    const step = minimumNormStep(jac, err);
    if (!step) break;
    let scale = 1;
    let improved = false;
    for (let b = 0; b < 20; b++, scale /= 2) {
      const uTry = u.map((v, k) => v + scale * step[k]);
      const rTry = photonBudgetForDepths(lb, tauAt(uTry), cascade, kappa);
      const eTry = diff(xy, xyOf(rTry.spd));
      if (Math.hypot(...eTry) < Math.hypot(...err)) {
        [u, result, err, improved] = [uTry, rTry, eTry, true];
        break;
      }
    }
    if (!improved) break;
  }
  if (Math.hypot(...err) > 1e-5) {
    return { ok: false, reason: `The loading model with re-absorption at ${L} mm cannot bring this mix onto the colour point.` };
  }
  const tau = tauAt(u);
  const wt = wtPctForDepths(lb, tau, loading);
  if (!wt.ok) return wt;
  return { ok: true, concentrationsWtPct: wt.concentrationsWtPct, opticalDepths: tau, result };
}

const diff = (a: [number, number], b: [number, number]): [number, number] => [a[0] - b[0], a[1] - b[1]];

/** Δu = Jᵀ(JJᵀ)⁻¹e for J (2×m, given as m columns); with one unknown, least squares. */
function minimumNormStep(cols: number[][], e: [number, number]): number[] | null {
  if (cols.length === 1) {
    const [a, b] = cols[0];
    const d = a * a + b * b;
    return d > 0 ? [(a * e[0] + b * e[1]) / d] : null;
  }
  let s00 = 0;
  let s01 = 0;
  let s11 = 0;
  for (const [a, b] of cols) {
    s00 += a * a;
    s01 += a * b;
    s11 += b * b;
  }
  const det = s00 * s11 - s01 * s01;
  if (!(Math.abs(det) > 1e-300)) return null;
  const y0 = (s11 * e[0] - s01 * e[1]) / det;
  const y1 = (s00 * e[1] - s01 * e[0]) / det;
  return cols.map(([a, b]) => a * y0 + b * y1);
}
