/**
 * The two planes of the colour-map chart and their scales (pure; no DOM).
 *   'xy' — CIE 1931 x,y chromaticity (CIE 15:2004 eq. 7.4);
 *   'uv' — CIE 1976 UCS u′,v′ (CIE 15:2004 eq. 8.1): u′ = 4x/(−2x+12y+3), v′ = 9y/(−2x+12y+3).
 * Chromaticity diagrams keep one unit the same length on both axes, so `equalAspectScales`
 * widens the shorter domain side (about its centre) until the pixel-per-unit ratio matches.
 */
import { scaleLinear, type ScaleLinear } from 'd3';
import { uvPrimeToXy, xyToUvPrime, type Pair } from '../spectral/colorimetry/chromaticity';

export type ChromaticityMode = 'xy' | 'uv';

export const PLANE_LABELS: Record<ChromaticityMode, { name: string; axisX: string; axisY: string }> = {
  xy: { name: 'CIE 1931 x,y', axisX: 'x', axisY: 'y' },
  uv: { name: 'CIE 1976 u′,v′', axisX: 'u′', axisY: 'v′' }
};

/** A CIE 1931 x,y point in the plane of `mode`. */
export function toPlane(mode: ChromaticityMode, x: number, y: number): Pair {
  return mode === 'xy' ? [x, y] : xyToUvPrime(x, y);
}

/** A plane point back to CIE 1931 x,y. */
export function fromPlane(mode: ChromaticityMode, a: number, b: number): Pair {
  return mode === 'xy' ? [a, b] : uvPrimeToXy(a, b);
}

export interface PlaneDomain {
  x: [number, number];
  y: [number, number];
}

export interface PlotBox {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

/** The whole diagram (spectral locus with a small border). */
export const WHOLE_DIAGRAM: Record<ChromaticityMode, PlaneDomain> = {
  xy: { x: [-0.02, 0.78], y: [-0.02, 0.86] },
  uv: { x: [-0.02, 0.66], y: [-0.02, 0.62] }
};

/** Half-width of the "near the target" window, in plane units (about ±12 SDCM near 3000 K in x,y). */
export const NEAR_HALF_SPAN: Record<ChromaticityMode, number> = { xy: 0.06, uv: 0.035 };

/** A square window of half-width `halfSpan` around an x,y point, in the plane of `mode`. */
export function windowAround(mode: ChromaticityMode, x: number, y: number, halfSpan = NEAR_HALF_SPAN[mode]): PlaneDomain {
  const [a, b] = toPlane(mode, x, y);
  return { x: [a - halfSpan, a + halfSpan], y: [b - halfSpan, b + halfSpan] };
}

export interface PlaneScales {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  /** Pixels per plane unit (the same on both axes). */
  pxPerUnit: number;
}

/** Linear scales with equal units on both axes; y grows upwards. The domain is widened, never cut. */
export function equalAspectScales(box: PlotBox, domain: PlaneDomain): PlaneScales {
  const { margin } = box;
  const innerW = box.width - margin.left - margin.right;
  const innerH = box.height - margin.top - margin.bottom;
  const spanX = domain.x[1] - domain.x[0];
  const spanY = domain.y[1] - domain.y[0];
  if (!(innerW > 0 && innerH > 0 && spanX > 0 && spanY > 0)) throw new RangeError('plot box and domain must have positive size');
  const pxPerUnit = Math.min(innerW / spanX, innerH / spanY);
  const cx = (domain.x[0] + domain.x[1]) / 2;
  const cy = (domain.y[0] + domain.y[1]) / 2;
  const halfX = innerW / pxPerUnit / 2;
  const halfY = innerH / pxPerUnit / 2;
  return {
    x: scaleLinear()
      .domain([cx - halfX, cx + halfX])
      .range([margin.left, margin.left + innerW]),
    y: scaleLinear()
      .domain([cy - halfY, cy + halfY])
      .range([margin.top + innerH, margin.top]),
    pxPerUnit
  };
}

/** SVG path through plane points (optionally closed); points already in pixels. */
export function polylinePath(points: readonly Pair[], closed = false): string {
  if (points.length === 0) return '';
  let d = `M${points[0][0].toFixed(2)},${points[0][1].toFixed(2)}`;
  for (let i = 1; i < points.length; i++) d += `L${points[i][0].toFixed(2)},${points[i][1].toFixed(2)}`;
  return closed ? `${d}Z` : d;
}

/** Plane points → pixel path with the given scales. */
export function planePath(points: readonly Pair[], scales: Pick<PlaneScales, 'x' | 'y'>, closed = false): string {
  return polylinePath(
    points.map(([a, b]) => [scales.x(a), scales.y(b)] as Pair),
    closed
  );
}
