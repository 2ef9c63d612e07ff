/**
 * Hexagonal binning of a scatter of many points (Carr, Littlefield, Nicholson & Littlefield, "Scatterplot
 * matrix techniques for large N", J. Am. Stat. Assoc. 82:424–436, 1987): pointy-top hexagons of
 * circumradius r tile the plane in rows dy = 1.5 r apart, columns dx = √3 r apart, odd rows offset by
 * dx/2; each point goes to the nearer of the two candidate centres. Equal scales on both axes keep the
 * hexagons regular on the plot. Pure.
 */
export interface HexBin {
  /** Centre of the hexagon. */
  x: number;
  y: number;
  /** Points inside it. */
  n: number;
}

export function hexbin(xs: ArrayLike<number>, ys: ArrayLike<number>, r: number): HexBin[] {
  if (!(r > 0)) throw new RangeError('hexbin: the radius must be positive');
  const dx = r * Math.sqrt(3);
  const dy = r * 1.5;
  const bins = new Map<string, HexBin>();
  for (let k = 0; k < xs.length; k++) {
    const px = xs[k] / dx;
    const py = ys[k] / dy;
    let pj = Math.round(py);
    let pi = Math.round(px - (pj & 1) / 2);
    const py1 = py - pj;
    if (Math.abs(py1) * 3 > 1) {
      // Near a row boundary: the centre in the neighbouring row may be nearer.
      const px1 = px - pi - (pj & 1) / 2;
      const pj2 = pj + (py1 < 0 ? -1 : 1);
      const pi2 = Math.round(px - (pj2 & 1) / 2);
      const px2 = px - pi2 - (pj2 & 1) / 2;
      const py2 = py - pj2;
      // Compared in plot units (a column is √3 r, a row 1.5 r): the Euclidean distance to each centre.
      if ((px1 * dx) ** 2 + (py1 * dy) ** 2 > (px2 * dx) ** 2 + (py2 * dy) ** 2) {
        pi = pi2;
        pj = pj2;
      }
    }
    const key = `${pi},${pj}`;
    const bin = bins.get(key);
    if (bin) bin.n++;
    else bins.set(key, { x: (pi + (pj & 1) / 2) * dx, y: pj * dy, n: 1 });
  }
  return [...bins.values()];
}

/** The six corners of the hexagon around (x, y), pointy top, for drawing. */
export function hexCorners(x: number, y: number, r: number): [number, number][] {
  return Array.from({ length: 6 }, (_, i) => {
    const a = (Math.PI / 3) * i;
    return [x + r * Math.sin(a), y + r * Math.cos(a)] as [number, number];
  });
}
