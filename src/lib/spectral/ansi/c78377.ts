/**
 * Chromaticity bins of ANSI C78.377-2017 "Specifications for the Chromaticity of Solid-State
 * Lighting Products" [ANSI-C78.377-2017].
 * Nominal-CCT quadrangles (Table 1): CCT limits from Table 1, Duv limits = DuvT(limit) ± 0.006
 * where DuvT is the flexible-CCT Duv target (for 2700–6500 K this reproduces the
 * published corner points to ±0.0002). Corners mapped to CIE 1931 x,y with the exact inverse
 * (`cct/inverse.ts`); edges are straight lines in x,y. Order of corners: low-CCT/+Duv,
 * high-CCT/+Duv, high-CCT/−Duv, low-CCT/−Duv.
 * Flexible CCT (§ flexible CCT, from memory [M]): nominal T in 100 K steps, 2200–6500 K;
 *   DuvT = 57700·(1/T)² − 44.6·(1/T) + 0.00854 for T ≥ 2780 K, else 0; tolerance ±0.006;
 *   ΔT = 1.1900e−8·T³ − 1.5434e−4·T² + 0.7168·T − 956.13 (K).
 * Units: CCT in K, Duv in CIE 1960 u,v; x,y CIE 1931.
 */
import { cctDuvToXy } from '../cct/inverse';
import { uvToCctOhno2014 } from '../cct/ohno2014';
import { xyToUv, xyToUvPrime, type Pair } from '../colorimetry/chromaticity';
import { ANSI_C78377_2017_TABLE1, ANSI_FLEX_CCT_TOL, ANSI_FLEX_DUV, ANSI_FLEX_RANGE, type AnsiTable1Row } from '../data/ansi-c78377-2017';

export interface AnsiQuadrangle {
  nominalCct: number;
  /** Centre: target CCT and Duv. */
  centre: Pair;
  targetCct: number;
  targetDuv: number;
  cctMin: number;
  cctMax: number;
  /** Corners in x,y: low-CCT/+Duv, high-CCT/+Duv, high-CCT/−Duv, low-CCT/−Duv. */
  corners: [Pair, Pair, Pair, Pair];
}

/** Flexible-CCT Duv target at T (K). */
export function ansiDuvTarget(cctK: number): number {
  if (cctK < ANSI_FLEX_DUV.minCct) return 0;
  const r = 1 / cctK;
  return ANSI_FLEX_DUV.a * r * r + ANSI_FLEX_DUV.b * r + ANSI_FLEX_DUV.c;
}

/** Flexible-CCT tolerance ΔT at T (K). */
export function ansiCctTolerance(cctK: number): number {
  const { c3, c2, c1, c0 } = ANSI_FLEX_CCT_TOL;
  return c3 * cctK ** 3 + c2 * cctK ** 2 + c1 * cctK + c0;
}

function quadrangle(nominalCct: number, targetCct: number, targetDuv: number, lo: number, hi: number, tol: number): AnsiQuadrangle {
  const dLo = ansiDuvTarget(lo);
  const dHi = ansiDuvTarget(hi);
  return {
    nominalCct,
    targetCct,
    targetDuv,
    cctMin: lo,
    cctMax: hi,
    centre: cctDuvToXy(targetCct, targetDuv),
    corners: [cctDuvToXy(lo, dLo + tol), cctDuvToXy(hi, dHi + tol), cctDuvToXy(hi, dHi - tol), cctDuvToXy(lo, dLo - tol)]
  };
}

let nominal: AnsiQuadrangle[] | null = null;

/** The ten nominal-CCT quadrangles of Table 1 (2200–6500 K). */
export function ansiNominalQuadrangles(): AnsiQuadrangle[] {
  nominal ??= ANSI_C78377_2017_TABLE1.map((r: AnsiTable1Row) =>
    quadrangle(r.nominalCct, r.targetCct, r.targetDuv, r.cctMin, r.cctMax, r.duvTolerance)
  );
  return nominal;
}

/** Flexible-CCT quadrangle for a nominal T in 100 K steps within 2200–6500 K. */
export function ansiFlexibleQuadrangle(nominalCct: number): AnsiQuadrangle {
  const { minCct, maxCct, stepK } = ANSI_FLEX_RANGE;
  if (nominalCct < minCct || nominalCct > maxCct || nominalCct % stepK !== 0) {
    throw new RangeError(`flexible CCT must be a multiple of ${stepK} K in ${minCct}–${maxCct} K`);
  }
  const dT = ansiCctTolerance(nominalCct);
  return quadrangle(nominalCct, nominalCct, ansiDuvTarget(nominalCct), nominalCct - dT, nominalCct + dT, 0.006);
}

/** Point-in-convex-quadrangle test in x,y (points on an edge count as inside). */
export function isInQuadrangle(x: number, y: number, q: AnsiQuadrangle): boolean {
  let sign = 0;
  for (let i = 0; i < 4; i++) {
    const [x0, y0] = q.corners[i];
    const [x1, y1] = q.corners[(i + 1) % 4];
    const cross = (x1 - x0) * (y - y0) - (y1 - y0) * (x - x0);
    if (cross === 0) continue;
    const s = Math.sign(cross);
    if (sign === 0) sign = s;
    else if (s !== sign) return false;
  }
  return true;
}

export interface AnsiBinMatch {
  nominalCct: number;
  /** Distance from the bin centre: Euclidean in x,y and in u'v' (CIE 1976). */
  distanceXy: number;
  distanceUvPrime: number;
  /** CCT (K) and Duv of the point (Ohno 2014). */
  cct: number;
  duv: number;
}

/** Nominal CCT of the Table 1 bin that contains (x, y), or null (the same bin findAnsiBin names, without its CCT/Duv). */
// ANSI C78.377-2017 Table 1 (quadrangle corners).
export function ansiBinOf(x: number, y: number): number | null {
  for (const q of ansiNominalQuadrangles()) if (isInQuadrangle(x, y, q)) return q.nominalCct;
  return null;
}

/** Which Table 1 nominal bin contains (x, y), or null. */
export function findAnsiBin(x: number, y: number): AnsiBinMatch | null {
  for (const q of ansiNominalQuadrangles()) {
    if (!isInQuadrangle(x, y, q)) continue;
    const [u1, v1] = xyToUvPrime(x, y);
    const [u0, v0] = xyToUvPrime(q.centre[0], q.centre[1]);
    const { cct, duv } = uvToCctOhno2014(...xyToUv(x, y));
    return {
      nominalCct: q.nominalCct,
      distanceXy: Math.hypot(x - q.centre[0], y - q.centre[1]),
      distanceUvPrime: Math.hypot(u1 - u0, v1 - v0),
      cct,
      duv
    };
  }
  return null;
}
