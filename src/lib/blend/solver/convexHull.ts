/**
 * Chromaticity gamut of a component set: the convex hull of the component points and
 * the nearest reachable point to a target.
 *
 * Any mix S = Σ wₖÊₖ (wₖ ≥ 0) has a chromaticity that is a convex combination of the
 * component chromaticities (Grassmann's law; CIE 15:2004 §7.3 additivity), in x,y and —
 * because u′v′ is a projective map of x,y, which keeps straight lines — in u′v′ too.
 * So a target is reachable exactly when it lies in the hull. Hull: Andrew's monotone
 * chain (A. M. Andrew, Inf. Process. Lett. 9 (1979) 216–219). Distances in u′v′.
 */
export type Point = [number, number];

const cross = (o: Point, a: Point, b: Point): number => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);

/** Counter-clockwise hull, without repeated end point. */
export function convexHull(points: Point[]): Point[] {
  const p = points.slice().sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (p.length < 3) return p;
  const lower: Point[] = [];
  for (const q of p) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], q) <= 0) lower.pop();
    lower.push(q);
  }
  const upper: Point[] = [];
  for (let i = p.length - 1; i >= 0; i--) {
    const q = p[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], q) <= 0) upper.pop();
    upper.push(q);
  }
  return lower.slice(0, -1).concat(upper.slice(0, -1));
}

/** True when `q` is inside or on the counter-clockwise hull (tolerance `eps`). */
export function insideHull(hull: Point[], q: Point, eps = 1e-12): boolean {
  if (hull.length < 3) return false;
  for (let i = 0; i < hull.length; i++) {
    if (cross(hull[i], hull[(i + 1) % hull.length], q) < -eps) return false;
  }
  return true;
}

function nearestOnSegment(a: Point, b: Point, q: Point): Point {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.max(0, Math.min(1, ((q[0] - a[0]) * dx + (q[1] - a[1]) * dy) / len2)) : 0;
  return [a[0] + t * dx, a[1] + t * dy];
}

/** Nearest point of the hull (boundary or interior) to q, and its distance. */
export function nearestInHull(hull: Point[], q: Point): { point: Point; distance: number } {
  if (insideHull(hull, q)) return { point: q, distance: 0 };
  let best: Point = hull[0];
  let bestD = Infinity;
  for (let i = 0; i < hull.length; i++) {
    const c = nearestOnSegment(hull[i], hull[(i + 1) % hull.length], q);
    const d = Math.hypot(c[0] - q[0], c[1] - q[1]);
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  return { point: best, distance: bestD };
}
