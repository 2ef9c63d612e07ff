import { describe, expect, it } from 'vitest';
import { bandPath, eyeSensitivity, maxInRange, profileScales, stackContributions } from '../../../src/lib/charts/spectrum-stack';
import { GRID_LENGTH } from '../../../src/lib/spectral/grid';
import type { PlotBox } from '../../../src/lib/charts/chromaticity-plane';

const box: PlotBox = { width: 700, height: 260, margin: { top: 10, right: 20, bottom: 30, left: 50 } };

describe('light-profile scales', () => {
  // Hand-worked: 380–780 nm over 50…680 px; 555 nm is 175/400 of 630 px in: 50 + 275.625 = 325.625.
  it('puts 555 nm at 325.625 px and the power axis upwards', () => {
    const s = profileScales(box, 2);
    expect(s.x(555)).toBeCloseTo(325.625, 9);
    expect(s.y(0)).toBe(230);
    expect(s.y(2)).toBe(10);
    expect(s.y(1)).toBe(120);
  });
});

describe('stacked contributions', () => {
  const flat = (v: number) => new Float64Array(GRID_LENGTH).fill(v);

  it('stacks w·Ê so that the top edge is the total SPD', () => {
    const bands = stackContributions([flat(1), flat(2), flat(4)], [0.5, 0.25, 0.25]);
    expect(bands[0].lower[100]).toBe(0);
    expect(bands[0].upper[100]).toBe(0.5);
    expect(bands[1].lower[100]).toBe(0.5);
    expect(bands[2].upper[100]).toBe(0.5 + 0.5 + 1); // 0.5·1 + 0.25·2 + 0.25·4
  });

  it('draws a band as an area path and finds the maximum in the drawn range', () => {
    const s = profileScales(box, 2);
    const d = bandPath(s, { lower: flat(0), upper: flat(1) });
    expect(d.startsWith('M50,120')).toBe(true);
    const peaked = flat(0);
    peaked[850 - 360 - 30] = 9; // 800 nm: outside 380–780, ignored
    peaked[555 - 360] = 3;
    expect(maxInRange(peaked)).toBe(3);
  });

  it('scales V(λ) to the requested height (peak 1.0 at 555 nm, CIE 1931 ȳ)', () => {
    const v = eyeSensitivity(2);
    expect(v[555 - 360]).toBeCloseTo(2, 6);
  });
});
