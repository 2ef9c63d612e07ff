/**
 * Distance of a colour point from a target (or any centre), in the units formulators and quality quote:
 *   dx, dy  — CIE 1931 x,y differences;
 *   Δu′v′   — CIE 1976 UCS (CIE 15:2004 §8.1);
 *   Δuv     — CIE 1960 UCS (the space of Duv, ANSI C78.377);
 *   steps   — MacAdam-type steps (SDCM): n = √(g11Δx² + 2g12ΔxΔy + g22Δy²) with the ellipse metric of
 *             MacAdam, JOSA 32:247 (1942), computed by the core's `sdcmSteps`; the ellipse shape is the
 *             1-step IEC 60081 ellipse interpolated at the centre's CCT (core table, from memory), moved to
 *             the centre — or any ellipse the caller names (e.g. a published ANSI 3-step ellipse).
 * The ellipse shape is taken at the CCT the target states (ANSI C78.377 Table 1 target CCT for a bin), not
 * at a CCT recomputed from the target's x,y; the two differ by less than 1e-5 of the steps.
 * Tolerances are judged in their own units; the tolerance kind `sdcm` counts steps.
 */
import { ellipseForCct, sdcmSteps, type ChromaticityEllipse } from '../spectral/ansi/macadam';
import { xyToUv, xyToUvPrime } from '../spectral/colorimetry/chromaticity';

export interface ColourCentre {
  x: number;
  y: number;
  /** CCT of the centre (K): picks the ellipse shape. */
  cct: number;
}

/** Where a colour point sits relative to a centre. */
export interface ColourDistance {
  dx: number;
  dy: number;
  /** Distance in CIE 1976 u′v′. */
  deltaUvPrime: number;
  /** Distance in CIE 1960 uv (the Duv space). */
  deltaUv: number;
  /** MacAdam-type steps (1-step ellipse at the centre's CCT unless another ellipse is named). */
  steps: number;
}

export type Tolerance = { kind: 'deltaUvPrime'; value: number } | { kind: 'deltaUv'; value: number } | { kind: 'sdcm'; steps: number };

/** The 1-step ellipse used around a centre: IEC 60081 shape at the centre's CCT, centred on it. */
let lastEllipse: { x: number; y: number; cct: number; ellipse: ChromaticityEllipse } | null = null;

export function stepEllipseAt(centre: ColourCentre): ChromaticityEllipse {
  // A batch judges every part against one centre: the last ellipse is kept (same inputs, same object, frozen).
  const last = lastEllipse;
  if (last && last.x === centre.x && last.y === centre.y && last.cct === centre.cct) return last.ellipse;
  const ellipse = Object.freeze({ ...ellipseForCct(centre.cct), x: centre.x, y: centre.y, steps: 1 });
  lastEllipse = { x: centre.x, y: centre.y, cct: centre.cct, ellipse };
  return ellipse;
}

export function colourDistance(
  x: number,
  y: number,
  centre: ColourCentre,
  ellipse: ChromaticityEllipse = stepEllipseAt(centre)
): ColourDistance {
  const [up, vp] = xyToUvPrime(x, y);
  const [upc, vpc] = xyToUvPrime(centre.x, centre.y);
  const [u, v] = xyToUv(x, y);
  const [uc, vc] = xyToUv(centre.x, centre.y);
  return {
    dx: x - centre.x,
    dy: y - centre.y,
    deltaUvPrime: Math.hypot(up - upc, vp - vpc),
    deltaUv: Math.hypot(u - uc, v - vc),
    steps: sdcmSteps(x, y, { ...ellipse, x: centre.x, y: centre.y })
  };
}

/** True when `d` is within tolerance `t`, judged in the tolerance's own units. */
export function withinTolerance(d: ColourDistance, t: Tolerance): boolean {
  if (t.kind === 'sdcm') return d.steps <= t.steps + 1e-9;
  if (t.kind === 'deltaUv') return d.deltaUv <= t.value + 1e-12;
  return d.deltaUvPrime <= t.value + 1e-12;
}
