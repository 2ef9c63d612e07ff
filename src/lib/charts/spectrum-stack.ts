/**
 * Geometry of the light-profile chart (pure): each component's contribution wₖ·Êₖ(λ) stacked
 * on the 1 nm grid (optical superposition, Ohno, Opt. Eng. 44 (2005) 111302), the scales,
 * and the eye's sensitivity V(λ) = ȳ(λ) of the CIE 1931 2° observer [CIE-S014-1] for the
 * faint background curve.
 */
import { area, line, scaleLinear, type ScaleLinear } from 'd3';
import { CMF_1931_2DEG } from '../spectral/colorimetry/cmf';
import { GRID_LENGTH, GRID_START_NM } from '../spectral/grid';
import type { PlotBox } from './chromaticity-plane';

export const PROFILE_DOMAIN_NM: [number, number] = [380, 780];
/** Every second grid point is drawn (2 nm): below a pixel at the chart's width, and half the path length. */
export const PROFILE_STRIDE = 2;

export interface ProfileScales {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
}

/** x: wavelength (nm) → px; y: spectral power (0 … yMax) → px, upwards. */
export function profileScales(box: PlotBox, yMax: number, domainNm: [number, number] = PROFILE_DOMAIN_NM): ProfileScales {
  const { margin } = box;
  return {
    x: scaleLinear()
      .domain(domainNm)
      .range([margin.left, box.width - margin.right]),
    y: scaleLinear()
      .domain([0, yMax > 0 ? yMax : 1])
      .range([box.height - margin.bottom, margin.top])
  };
}

/** Cumulative bands: band k spans Σ_{j<k} wⱼÊⱼ … Σ_{j≤k} wⱼÊⱼ; the last upper edge is the total SPD. */
export function stackContributions(
  components: readonly Float64Array[],
  fractions: readonly number[]
): { lower: Float64Array; upper: Float64Array }[] {
  let below = new Float64Array(GRID_LENGTH);
  return components.map((spd, k) => {
    const upper = new Float64Array(GRID_LENGTH);
    const w = fractions[k] ?? 0;
    for (let i = 0; i < GRID_LENGTH; i++) upper[i] = below[i] + w * spd[i];
    const band = { lower: below, upper };
    below = upper;
    return band;
  });
}

/** Maximum of an array over the drawn wavelength range. */
export function maxInRange(values: ArrayLike<number>, domainNm: [number, number] = PROFILE_DOMAIN_NM): number {
  let m = 0;
  for (let nm = domainNm[0]; nm <= domainNm[1]; nm++) m = Math.max(m, values[nm - GRID_START_NM]);
  return m;
}

function indicesInRange(domainNm: [number, number], stride: number): number[] {
  const out: number[] = [];
  for (let nm = domainNm[0]; nm <= domainNm[1]; nm += stride) out.push(nm - GRID_START_NM);
  return out;
}

/** SVG area between the lower and upper edges of a band. */
export function bandPath(
  scales: ProfileScales,
  band: { lower: ArrayLike<number>; upper: ArrayLike<number> },
  stride = PROFILE_STRIDE
): string {
  const idx = indicesInRange(scales.x.domain() as [number, number], stride);
  return (
    area<number>()
      .x((i) => scales.x(GRID_START_NM + i))
      .y0((i) => scales.y(band.lower[i]))
      .y1((i) => scales.y(band.upper[i]))(idx) ?? ''
  );
}

/** SVG line of a gridded series. */
export function seriesPath(scales: ProfileScales, values: ArrayLike<number>, stride = PROFILE_STRIDE): string {
  const idx = indicesInRange(scales.x.domain() as [number, number], stride);
  return (
    line<number>()
      .x((i) => scales.x(GRID_START_NM + i))
      .y((i) => scales.y(values[i]))(idx) ?? ''
  );
}

/** V(λ) scaled so its maximum (1 at 555 nm) reaches `top`. */
export function eyeSensitivity(top: number): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = CMF_1931_2DEG.yBar[i] * top;
  return out;
}
