/**
 * Axis ranges of the chromaticity plot: the bounding box of what must be visible, padded, then
 * widened in one direction so one unit of x and one unit of y take the same length on screen
 * (ellipses and quadrangles keep their true shape).
 */
export interface PlotDomain {
  x: [number, number];
  y: [number, number];
}

export function fitDomain(
  points: readonly (readonly [number, number])[],
  widthPx: number,
  heightPx: number,
  padFraction = 0.08,
  minSpan = 0.004
): PlotDomain {
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    x0 = Math.min(x0, x);
    x1 = Math.max(x1, x);
    y0 = Math.min(y0, y);
    y1 = Math.max(y1, y);
  }
  if (x0 > x1) return { x: [0, 0.8], y: [0, 0.9] };
  const cx = (x0 + x1) / 2;
  const cy = (y0 + y1) / 2;
  let sx = Math.max(x1 - x0, minSpan) * (1 + 2 * padFraction);
  let sy = Math.max(y1 - y0, minSpan) * (1 + 2 * padFraction);
  const unitsPerPx = Math.max(sx / widthPx, sy / heightPx);
  sx = unitsPerPx * widthPx;
  sy = unitsPerPx * heightPx;
  return { x: [cx - sx / 2, cx + sx / 2], y: [cy - sy / 2, cy + sy / 2] };
}
