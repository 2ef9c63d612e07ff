/**
 * Inverse of CCT/Duv: the chromaticity at a given CCT and Duv, for drawing bins and targets.
 * Y. Ohno, LEUKOS 10(1):47–55, 2014, §4 [Ohno2014]: offset the Planckian point (u_T, v_T)
 * by Duv along the unit normal of the locus, found from the point at T + ΔT (ΔT = 0.01 K):
 *   du = u_T − u_{T+ΔT}, dv = v_T − v_{T+ΔT}, l = √(du² + dv²)
 *   u = u_T − Duv·dv/l,  v = v_T + Duv·du/l          (positive Duv → above the locus)
 * Exact Planckian u,v (Planck's law × CIE 1931 2° CMFs, 360–830 nm, 1 nm).
 * Units: T in K (any T > 0), Duv in 1960 u,v units; outputs dimensionless.
 */
import { uvToXy, type Pair } from '../colorimetry/chromaticity';
import { planckianUv } from './planckian-locus';

const DELTA_T_K = 0.01;

export function cctDuvToUv(cctK: number, duv: number): Pair {
  const [u0, v0] = planckianUv(cctK);
  const [u1, v1] = planckianUv(cctK + DELTA_T_K);
  const du = u0 - u1;
  const dv = v0 - v1;
  const l = Math.hypot(du, dv);
  return [u0 - (duv * dv) / l, v0 + (duv * du) / l];
}

export function cctDuvToXy(cctK: number, duv: number): Pair {
  const [u, v] = cctDuvToUv(cctK, duv);
  return uvToXy(u, v);
}
