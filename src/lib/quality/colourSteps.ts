/**
 * Distance of a measured colour point from a centre, in the units quality quotes:
 * x,y differences (CIE 1931), Δu′v′ (CIE 15:2004 §8.1), Δuv (CIE 1960, the Duv space) and
 * MacAdam-type steps.
 * Steps: n = √(g11Δx² + 2g12ΔxΔy + g22Δy²) with the ellipse metric of MacAdam, JOSA 32:247
 * (1942), computed by the core's `sdcmSteps`; the ellipse shape is the 1-step IEC 60081
 * ellipse interpolated at the centre's CCT (core table, from memory), moved to the centre —
 * or any ellipse the caller names (e.g. a published ANSI 3-step ellipse).
 */
import { ellipseForCct, sdcmSteps, type ChromaticityEllipse } from '../spectral/ansi/macadam';
import { xyToUv, xyToUvPrime } from '../spectral/colorimetry/chromaticity';
import type { ColourOffset } from './types';

export interface ColourCentre {
  x: number;
  y: number;
  /** CCT of the centre (K): picks the ellipse shape. */
  cct: number;
}

/** The 1-step ellipse used around a centre: IEC 60081 shape at the centre's CCT, centred on it. */
export function stepEllipseAt(centre: ColourCentre): ChromaticityEllipse {
  return { ...ellipseForCct(centre.cct), x: centre.x, y: centre.y, steps: 1 };
}

export function colourOffset(x: number, y: number, centre: ColourCentre, ellipse: ChromaticityEllipse = stepEllipseAt(centre)): ColourOffset {
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
