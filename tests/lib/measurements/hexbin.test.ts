/**
 * Hexagonal binning (Carr et al. 1987): every point lands in the bin whose centre is nearest (the
 * defining property of a hexagonal tessellation's cells), counts add up, and the centres form the
 * lattice (rows 1.5 r apart, neighbours √3 r apart).
 */
import { describe, expect, it } from 'vitest';
import { hexbin, hexCorners } from '../../../src/lib/measurements/hexbin';

describe('hexbin', () => {
  it('puts each of 20,000 random points in the bin with the nearest centre; counts add up', () => {
    let s = 7;
    const rnd = () => (s = (s * 16807) % 2147483647) / 2147483647;
    const xs = Float64Array.from({ length: 20_000 }, () => 0.42 + 0.03 * rnd());
    const ys = Float64Array.from({ length: 20_000 }, () => 0.39 + 0.03 * rnd());
    const r = 0.001;
    const bins = hexbin(xs, ys, r);
    expect(bins.reduce((a, b) => a + b.n, 0)).toBe(20_000);
    // Lattice: every centre is a whole number of rows (1.5 r) from 0, and of half-columns (√3 r / 2).
    for (const b of bins) {
      expect(Math.abs(b.y / (1.5 * r) - Math.round(b.y / (1.5 * r)))).toBeLessThan(1e-9);
      expect(Math.abs(b.x / ((Math.sqrt(3) * r) / 2) - Math.round(b.x / ((Math.sqrt(3) * r) / 2)))).toBeLessThan(1e-9);
    }
    // Nearest centre: each point counted again by brute force over the occupied centres gives the same counts.
    const recount = new Array<number>(bins.length).fill(0);
    for (let k = 0; k < xs.length; k++) {
      let best = 0;
      let d = Infinity;
      for (let i = 0; i < bins.length; i++) {
        const dd = (bins[i].x - xs[k]) ** 2 + (bins[i].y - ys[k]) ** 2;
        if (dd < d) [d, best] = [dd, i];
      }
      recount[best]++;
      expect(Math.sqrt(d)).toBeLessThanOrEqual(r + 1e-12); // inside the hexagon's circumcircle
    }
    expect(recount).toEqual(bins.map((b) => b.n));
  });

  it('draws a regular hexagon of circumradius r', () => {
    const c = hexCorners(0.43, 0.4, 0.002);
    expect(c).toHaveLength(6);
    for (const [x, y] of c) expect(Math.hypot(x - 0.43, y - 0.4)).toBeCloseTo(0.002, 12);
  });

  it('refuses a radius that is not positive', () => {
    expect(() => hexbin([0], [0], 0)).toThrow(/radius must be positive/);
  });
});
