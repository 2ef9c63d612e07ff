/**
 * Shapes drawn on the chromaticity plot, as polylines in CIE 1931 x,y:
 *  - an n-step ellipse (centre, 1-step semi-axes a, b, angle θ from +x; MacAdam 1942 form);
 *  - a tolerance outline: the n-step ellipse, or a circle of radius r in CIE 1976 u′v′
 *    (CIE 15:2004 §8.1) or CIE 1960 uv mapped back to x,y (not an ellipse in x,y);
 *  - the Planckian locus between two CCTs (exact Planck × CIE 1931 2°, via the core);
 *  - an ANSI C78.377 quadrangle (straight edges in x,y between the core's corners).
 */
import { stepEllipseAt, type ColourCentre, type Tolerance } from '../aim/index';
import type { AnsiQuadrangle } from '../spectral/ansi/c78377';
import type { ChromaticityEllipse } from '../spectral/ansi/macadam';
import { cctDuvToXy } from '../spectral/cct/inverse';
import { uvPrimeToXy, uvToXy, xyToUv, xyToUvPrime, type Pair } from '../spectral/colorimetry/chromaticity';

/** Ellipse of `steps` steps (the ellipse's own axes are at `ellipse.steps ?? 1` steps). */
export function ellipseOutline(ellipse: ChromaticityEllipse, steps: number, points = 96): Pair[] {
  const k = steps / (ellipse.steps ?? 1);
  const th = (ellipse.thetaDeg * Math.PI) / 180;
  const out: Pair[] = [];
  for (let i = 0; i <= points; i++) {
    const t = (2 * Math.PI * i) / points;
    const ea = ellipse.a * k * Math.cos(t);
    const eb = ellipse.b * k * Math.sin(t);
    out.push([ellipse.x + ea * Math.cos(th) - eb * Math.sin(th), ellipse.y + ea * Math.sin(th) + eb * Math.cos(th)]);
  }
  return out;
}

function circleOutline(centre: ColourCentre, radius: number, space: 'uvPrime' | 'uv', points = 96): Pair[] {
  const [uc, vc] = space === 'uvPrime' ? xyToUvPrime(centre.x, centre.y) : xyToUv(centre.x, centre.y);
  const back = space === 'uvPrime' ? uvPrimeToXy : uvToXy;
  const out: Pair[] = [];
  for (let i = 0; i <= points; i++) {
    const t = (2 * Math.PI * i) / points;
    out.push(back(uc + radius * Math.cos(t), vc + radius * Math.sin(t)));
  }
  return out;
}

/** Outline of the colour tolerance around the target. */
export function toleranceOutline(centre: ColourCentre, tolerance: Tolerance): Pair[] {
  if (tolerance.kind === 'sdcm') return ellipseOutline(stepEllipseAt(centre), tolerance.steps);
  return circleOutline(centre, tolerance.value, tolerance.kind === 'deltaUvPrime' ? 'uvPrime' : 'uv');
}

/** Planckian locus from `fromK` to `toK`, evenly spaced in mired. */
export function planckianOutline(fromK: number, toK: number, points = 120): Pair[] {
  const m0 = 1e6 / fromK;
  const m1 = 1e6 / toK;
  return Array.from({ length: points + 1 }, (_, i) => cctDuvToXy(1e6 / (m0 + ((m1 - m0) * i) / points), 0));
}

/** Closed polygon of a quadrangle's corners. */
export function quadrangleOutline(q: AnsiQuadrangle): Pair[] {
  return [...q.corners, q.corners[0]];
}
