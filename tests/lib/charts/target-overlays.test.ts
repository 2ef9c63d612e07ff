import { describe, expect, it } from 'vitest';
import { ansiQuadrangleShapes, ellipseOutlineXy, macadamEllipses, reachablePolygon } from '../../../src/lib/charts/target-overlays';
import { sdcmSteps } from '../../../src/lib/spectral/ansi/macadam';
import { xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';

describe('ANSI C78.377 quadrangles on the colour map', () => {
  // ANSI C78.377 3000 K corners (x,y) as published (public transcription of ANSI C78.377-2015 Table 1):
  const published3000 = [
    [0.4562, 0.426],
    [0.4303, 0.4173],
    [0.415, 0.3821],
    [0.4373, 0.3893]
  ];

  it('draws the 3000 K bin at the published corners and marks it as the target bin', () => {
    const quads = ansiQuadrangleShapes('xy', 3000);
    const q = quads.find((s) => s.nominalCct === 3000)!;
    expect(q.role).toBe('target');
    q.corners.forEach(([x, y], i) => {
      expect(Math.abs(x - published3000[i][0])).toBeLessThan(4e-4);
      expect(Math.abs(y - published3000[i][1])).toBeLessThan(4e-4);
    });
    expect(
      quads
        .filter((s) => s.role === 'neighbour')
        .map((s) => s.nominalCct)
        .sort()
    ).toEqual([2700, 3500]);
  });

  it('maps the corners into u′,v′ in the other plane', () => {
    const [u, v] = xyToUvPrime(...(published3000[0] as [number, number]));
    const q = ansiQuadrangleShapes('uv', 3000).find((s) => s.nominalCct === 3000)!;
    expect(Math.abs(q.corners[0][0] - u)).toBeLessThan(4e-4);
    expect(Math.abs(q.corners[0][1] - v)).toBeLessThan(4e-4);
  });

  it('marks no target bin for a CCT outside Table 1', () => {
    expect(ansiQuadrangleShapes('xy', 1500).every((s) => s.role === 'other')).toBe(true);
  });
});

describe('MacAdam-type ellipses around the target', () => {
  // IEC 60081 F3000 1-step ellipse (from memory): a = 0.00278, b = 0.00136, θ = 53.13°,
  // so cos θ = 0.6, sin θ = 0.8. The 7-step major-axis end lies 7·0.00278 = 0.01946 along (0.6, 0.8):
  // Δx = 0.011676, Δy = 0.015568 (hand-worked).
  it('puts the 7-step major-axis end where the hand calculation says', () => {
    const [p0] = ellipseOutlineXy(0.4339, 0.4033, 3000, 7);
    expect(p0[0] - 0.4339).toBeCloseTo(0.011676, 5);
    expect(p0[1] - 0.4033).toBeCloseTo(0.015568, 5);
  });

  it('draws every outline point at exactly n steps (MacAdam 1942 metric)', () => {
    const ellipses = macadamEllipses('xy', 0.4339, 0.4033, 3000);
    expect(ellipses.map((e) => e.steps)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    const shape = { name: 'F3000', nominalCct: 3000, x: 0.4339, y: 0.4033, a: 0.00278, b: 0.00136, thetaDeg: 53.13 };
    for (const e of ellipses) for (const [x, y] of e.points) expect(sdcmSteps(x, y, shape)).toBeCloseTo(e.steps, 6);
  });
});

describe('reachable region of a component set', () => {
  it('is the convex hull of the component points: an inner point is dropped', () => {
    const hull = reachablePolygon('xy', [
      [0.15, 0.03],
      [0.35, 0.6],
      [0.68, 0.31],
      [0.4, 0.35]
    ]);
    expect(hull).toHaveLength(3);
    expect(hull).not.toContainEqual([0.4, 0.35]);
  });
});
