/**
 * Distance between a colour point and its target, in the units formulators quote:
 *   Δu′v′ — CIE 1976 UCS (CIE 15:2004 §8.1); Δuv — CIE 1960 UCS (the space of Duv,
 *   ANSI C78.377); SDCM — MacAdam-type steps from the core (`sdcmFromTarget`: 1-step
 *   IEC 60081 ellipses interpolated at the target CCT, centred on the target) [ellipse
 *   values from memory in the core's table].
 */
import { sdcmFromTarget } from '../../spectral/ansi/macadam';
import { uvToCct } from '../../spectral/cct/index';
import { xyToUv, xyToUvPrime } from '../../spectral/colorimetry/chromaticity';
import type { ChromaticityError } from '../types';

export type Tolerance =
  | { kind: 'deltaUvPrime'; value: number }
  | { kind: 'deltaUv'; value: number }
  | { kind: 'sdcm'; steps: number };

export function chromaticityError(x: number, y: number, xt: number, yt: number): ChromaticityError {
  const [up, vp] = xyToUvPrime(x, y);
  const [upt, vpt] = xyToUvPrime(xt, yt);
  const [u, v] = xyToUv(x, y);
  const [ut, vt] = xyToUv(xt, yt);
  const cctT = uvToCct(ut, vt).cct;
  return {
    deltaUvPrime: Math.hypot(up - upt, vp - vpt),
    deltaUv: Math.hypot(u - ut, v - vt),
    sdcm: sdcmFromTarget(x, y, xt, yt, cctT)
  };
}

/** True when `e` is within tolerance `t`, judged in the tolerance's own units. */
export function withinTolerance(e: ChromaticityError, t: Tolerance): boolean {
  if (t.kind === 'sdcm') return e.sdcm <= t.steps + 1e-9;
  if (t.kind === 'deltaUv') return e.deltaUv <= t.value + 1e-12;
  return e.deltaUvPrime <= t.value + 1e-12;
}
