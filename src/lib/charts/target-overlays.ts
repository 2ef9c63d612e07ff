/**
 * Overlays of the colour map that depend on the target or the components (pure):
 *  - ANSI C78.377-2017 Table 1 quadrangles (core's `ansiNominalQuadrangles`); edges are straight
 *    in x,y and stay straight in u′,v′ (a projective map of x,y keeps lines);
 *  - MacAdam-type ellipses of n steps around the target: the core's 1-step IEC 60081 ellipse
 *    for the target CCT (`ellipseForCct`, values from memory) scaled by n and
 *    centred on the target; parametric x = xc + n·a·cos t·cos θ − n·b·sin t·sin θ,
 *    y = yc + n·a·cos t·sin θ + n·b·sin t·cos θ (MacAdam, JOSA 32 (1942) 247);
 *  - the reachable region of a component set: convex hull of the component chromaticities
 *    (Grassmann additivity, CIE 15:2004 §7.3; hull by the blend solver's Andrew monotone chain).
 */
import { ansiNominalQuadrangles } from '../spectral/ansi/c78377';
import { ellipseForCct } from '../spectral/ansi/macadam';
import type { Pair } from '../spectral/colorimetry/chromaticity';
import { convexHull } from '../blend/solver/convexHull';
import { toPlane, type ChromaticityMode } from './chromaticity-plane';

export interface QuadrangleShape {
  nominalCct: number;
  corners: Pair[];
  centre: Pair;
  /** The bin of the target, or a neighbour of it. */
  role: 'target' | 'neighbour' | 'other';
}

/** All Table 1 quadrangles in the plane; the one whose CCT range holds the target CCT is the 'target' bin. */
export function ansiQuadrangleShapes(mode: ChromaticityMode, targetCctK: number | null): QuadrangleShape[] {
  const quads = ansiNominalQuadrangles();
  const nearest = targetCctK === null ? -1 : quads.findIndex((q) => targetCctK >= q.cctMin && targetCctK <= q.cctMax);
  return quads.map((q, i) => ({
    nominalCct: q.nominalCct,
    corners: q.corners.map(([x, y]) => toPlane(mode, x, y)),
    centre: toPlane(mode, q.centre[0], q.centre[1]),
    role: nearest < 0 ? 'other' : i === nearest ? 'target' : Math.abs(i - nearest) === 1 ? 'neighbour' : 'other'
  }));
}

export const ELLIPSE_STEPS = [1, 2, 3, 4, 5, 6, 7] as const;

/** x,y outline of an n-step ellipse around (xc, yc) with the 1-step shape for `cctK`. */
export function ellipseOutlineXy(xc: number, yc: number, cctK: number, steps: number, samples = 72): Pair[] {
  const e = ellipseForCct(cctK);
  const th = (e.thetaDeg * Math.PI) / 180;
  const a = e.a * steps;
  const b = e.b * steps;
  const out: Pair[] = [];
  for (let k = 0; k < samples; k++) {
    const t = (2 * Math.PI * k) / samples;
    const ca = a * Math.cos(t);
    const sb = b * Math.sin(t);
    out.push([xc + ca * Math.cos(th) - sb * Math.sin(th), yc + ca * Math.sin(th) + sb * Math.cos(th)]);
  }
  return out;
}

export function macadamEllipses(
  mode: ChromaticityMode,
  xc: number,
  yc: number,
  cctK: number,
  steps: readonly number[] = ELLIPSE_STEPS
): { steps: number; points: Pair[] }[] {
  return steps.map((n) => ({ steps: n, points: ellipseOutlineXy(xc, yc, cctK, n).map(([x, y]) => toPlane(mode, x, y)) }));
}

/** Convex hull of component chromaticities (x,y in), in the plane of `mode`. */
export function reachablePolygon(mode: ChromaticityMode, componentsXy: readonly Pair[]): Pair[] {
  return convexHull(componentsXy.map(([x, y]) => toPlane(mode, x, y)));
}
