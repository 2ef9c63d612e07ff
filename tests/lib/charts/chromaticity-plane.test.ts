import { describe, expect, it } from 'vitest';
import { equalAspectScales, fromPlane, planePath, toPlane, windowAround, type PlotBox } from '../../../src/lib/charts/chromaticity-plane';

const box: PlotBox = { width: 600, height: 500, margin: { top: 40, right: 40, bottom: 40, left: 40 } };

describe('colour-map scales: a known chromaticity lands on the right pixel', () => {
  // Hand-worked: inner box 520 × 420 px; domain 0.3–0.5 on both axes → 2600 px/unit across,
  // 2100 px/unit down; the smaller wins (2100), so x is widened to 520/2100 = 0.247619 about 0.4.
  // Centre pixel (300, 250). The ANSI 3000 K centre x,y = (0.4339, 0.4033) (ANSI C78.377-2017 Table 1,
  // via): x px = 300 + 0.0339·2100 = 371.19; y px = 250 − 0.0033·2100 = 243.07.
  const s = equalAspectScales(box, { x: [0.3, 0.5], y: [0.3, 0.5] });

  it('uses the same pixels per unit on both axes', () => {
    expect(s.pxPerUnit).toBeCloseTo(2100, 9);
    expect(s.x(0.5) - s.x(0.4)).toBeCloseTo(210, 9);
    expect(s.y(0.4) - s.y(0.5)).toBeCloseTo(210, 9);
  });

  it('puts x,y (0.4339, 0.4033) at (371.19, 243.07) px', () => {
    expect(s.x(0.4339)).toBeCloseTo(371.19, 2);
    expect(s.y(0.4033)).toBeCloseTo(243.07, 2);
  });

  it('keeps the plot inside the margins and y growing upwards', () => {
    expect(s.x.range()).toEqual([40, 560]);
    expect(s.y.range()).toEqual([460, 40]);
    expect(s.y(0.5)).toBeCloseTo(40, 9); // the taller side fills the box exactly
    expect(s.x.domain()[0]).toBeCloseTo(0.4 - 0.247619 / 2, 5);
  });

  it('refuses an empty box or domain', () => {
    expect(() => equalAspectScales(box, { x: [0.3, 0.3], y: [0, 1] })).toThrow(RangeError);
  });
});

describe('CIE 1976 u′,v′ plane', () => {
  // CIE 15:2004 Table T.3: D65 x,y = (0.31272, 0.32903); u′ = 4x/(−2x+12y+3) = 1.25088/6.32292 = 0.19783,
  // v′ = 9y/(−2x+12y+3) = 2.96127/6.32292 = 0.46834 (hand-worked, eq. 8.1).
  it('maps D65 to (0.19783, 0.46834) and back', () => {
    const [u, v] = toPlane('uv', 0.31272, 0.32903);
    expect(u).toBeCloseTo(0.19783, 5);
    expect(v).toBeCloseTo(0.46834, 5);
    const [x, y] = fromPlane('uv', u, v);
    expect(x).toBeCloseTo(0.31272, 10);
    expect(y).toBeCloseTo(0.32903, 10);
  });

  it('leaves x,y alone in the x,y plane', () => {
    expect(toPlane('xy', 0.4, 0.3)).toEqual([0.4, 0.3]);
  });

  it('centres the near-target window on the target in the chosen plane', () => {
    const w = windowAround('uv', 0.31272, 0.32903, 0.01);
    expect((w.x[0] + w.x[1]) / 2).toBeCloseTo(0.19783, 5);
    expect(w.y[1] - w.y[0]).toBeCloseTo(0.02, 12);
  });
});

describe('path strings', () => {
  it('draws plane points through the scales, closed on request', () => {
    const s = equalAspectScales(box, { x: [0.3, 0.5], y: [0.3, 0.5] });
    expect(
      planePath(
        [
          [0.4, 0.4],
          [0.5, 0.4]
        ],
        s,
        true
      )
    ).toBe('M300.00,250.00L510.00,250.00Z');
  });
});
