/**
 * Target colour point of an aim (solve, designer, revision, weigh-out, quality): CCT + Duv, x,y, or the centre of an ANSI C78.377 bin.
 *
 * CCT/Duv → x,y by the core's inverse of Ohno 2014 (Ohno, LEUKOS 10 (2014) 47–55, §4).
 * ANSI bins: ANSI C78.377-2017 Table 1 quadrangles for the nominal CCTs of the table,
 * otherwise the flexible-CCT quadrangle (2200–6500 K in 100 K steps) — both from the
 * core (`spectral/ansi/c78377.ts`); the target is the quadrangle centre (target CCT, Duv).
 */
import { ansiFlexibleQuadrangle, ansiNominalQuadrangles, type AnsiQuadrangle } from '../spectral/ansi/c78377';
import { cctDuvToXy, uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';

export type Target =
  { kind: 'cctDuv'; cct: number; duv: number } | { kind: 'xy'; x: number; y: number } | { kind: 'ansiBin'; nominalCct: number };

export interface ResolvedTarget {
  x: number;
  y: number;
  cct: number;
  duv: number;
  label: string;
  /** The ANSI quadrangle when the target is a bin. */
  ansiBin: AnsiQuadrangle | null;
}

export function ansiQuadrangle(nominalCct: number): AnsiQuadrangle {
  return ansiNominalQuadrangles().find((q) => q.nominalCct === nominalCct) ?? ansiFlexibleQuadrangle(nominalCct);
}

export function resolveTarget(target: Target): ResolvedTarget {
  if (target.kind === 'xy') {
    const { cct, duv } = uvToCct(...xyToUv(target.x, target.y));
    return { x: target.x, y: target.y, cct, duv, label: `x ${target.x}, y ${target.y}`, ansiBin: null };
  }
  if (target.kind === 'cctDuv') {
    const [x, y] = cctDuvToXy(target.cct, target.duv);
    return { x, y, cct: target.cct, duv: target.duv, label: `${target.cct} K, Duv ${target.duv}`, ansiBin: null };
  }
  const q = ansiQuadrangle(target.nominalCct);
  return {
    x: q.centre[0],
    y: q.centre[1],
    cct: q.targetCct,
    duv: q.targetDuv,
    label: `ANSI C78.377 ${q.nominalCct} K bin centre`,
    ansiBin: q
  };
}
