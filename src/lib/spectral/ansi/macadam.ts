/**
 * Colour difference in "steps" of a chromaticity ellipse (MacAdam ellipse / SDCM).
 * D. L. MacAdam, "Visual sensitivities to color differences in daylight", JOSA 32:247, 1942
 * [MacAdam1942]; metric form as in:
 *   n = √(g11 Δx² + 2 g12 Δx Δy + g22 Δy²)
 *   g11 = cos²θ/a² + sin²θ/b²,  g12 = sinθ cosθ (1/a² − 1/b²),  g22 = sin²θ/a² + cos²θ/b²
 * with a, b the 1-step semi-axes and θ the major-axis angle from +x.
 * Ellipse data: IEC 60081 1-step ellipses [IEC-60081], FROM MEMORY [from memory];
 * the ANSI 2700 K 3-step example is seen on an LED datasheet [S]. Units: CIE 1931 x,y; θ in °.
 */
import { IEC_60081_ELLIPSES, type ChromaticityEllipse } from '../data/chromaticity-ellipses';

export type { ChromaticityEllipse };

/** Number of steps of (x, y) from the centre of `ellipse` (whose axes are at `steps` steps). */
export function sdcmSteps(x: number, y: number, ellipse: ChromaticityEllipse): number {
  const steps = ellipse.steps ?? 1;
  const a = ellipse.a / steps;
  const b = ellipse.b / steps;
  const th = (ellipse.thetaDeg * Math.PI) / 180;
  const c = Math.cos(th);
  const s = Math.sin(th);
  const g11 = (c * c) / (a * a) + (s * s) / (b * b);
  const g12 = s * c * (1 / (a * a) - 1 / (b * b));
  const g22 = (s * s) / (a * a) + (c * c) / (b * b);
  const dx = x - ellipse.x;
  const dy = y - ellipse.y;
  return Math.sqrt(g11 * dx * dx + 2 * g12 * dx * dy + g22 * dy * dy);
}

/**
 * 1-step ellipse for a CCT from the IEC 60081 table (from memory): 'nearest' row, or
 * 'interpolate' (linear in mired between neighbouring rows, clamped at the ends; centre,
 * axes and angle all interpolated). The result is centred on the table locus, not on the target.
 */
export function ellipseForCct(cctK: number, mode: 'nearest' | 'interpolate' = 'interpolate'): ChromaticityEllipse {
  const rows = IEC_60081_ELLIPSES; // sorted by rising CCT
  if (mode === 'nearest') {
    return rows.reduce((best, r) => (Math.abs(1e6 / r.nominalCct - 1e6 / cctK) < Math.abs(1e6 / best.nominalCct - 1e6 / cctK) ? r : best));
  }
  if (cctK <= rows[0].nominalCct) return rows[0];
  if (cctK >= rows[rows.length - 1].nominalCct) return rows[rows.length - 1];
  let i = 0;
  while (rows[i + 1].nominalCct < cctK) i++;
  const r0 = rows[i];
  const r1 = rows[i + 1];
  const f = (1e6 / cctK - 1e6 / r0.nominalCct) / (1e6 / r1.nominalCct - 1e6 / r0.nominalCct);
  const mix = (p: number, q: number): number => p + (q - p) * f;
  return {
    name: `IEC 60081 interpolated ${Math.round(cctK)} K`,
    nominalCct: cctK,
    x: mix(r0.x, r1.x),
    y: mix(r0.y, r1.y),
    a: mix(r0.a, r1.a),
    b: mix(r0.b, r1.b),
    thetaDeg: mix(r0.thetaDeg, r1.thetaDeg)
  };
}

/** Steps of (x, y) from a target (xt, yt) using the ellipse shape for the target CCT. */
export function sdcmFromTarget(
  x: number,
  y: number,
  xt: number,
  yt: number,
  cctK: number,
  mode: 'nearest' | 'interpolate' = 'interpolate'
): number {
  const e = ellipseForCct(cctK, mode);
  return sdcmSteps(x, y, { ...e, x: xt, y: yt, steps: 1 });
}
