import { describe, expect, it } from 'vitest';
import { colourDistance, stepEllipseAt } from '../../../src/lib/aim/index';
import {
  ellipseOutline,
  planckianOutline,
  predictedVsMeasured,
  qualityTarget,
  quadrangleOutline,
  toleranceOutline
} from '../../../src/lib/measurements/index';

describe('predicted vs measured (worked by hand)', () => {
  // Predicted (0.4339, 0.4033) = ANSI 3000 K centre (C78.377-2015); measured mean (0.4370, 0.4010).
  // dx = +0.0031, dy = −0.0023. u′ = 4x/(−2x + 12y + 3), v′ = 9y/(−2x + 12y + 3) (CIE 15:2004 eq. 8.1):
  //   predicted: d = −0.8678 + 4.8396 + 3 = 6.9718 → u′ = 0.248946, v′ = 0.520626
  //   measured:  d = −0.8740 + 4.8120 + 3 = 6.9380 → u′ = 0.251946, v′ = 0.520179
  //   Δu′v′ = √(0.003000² + 0.000447²) = 0.003033.
  const c = predictedVsMeasured({ x: 0.4339, y: 0.4033 }, { x: 0.437, y: 0.401 });
  it('offset in x,y and u′v′', () => {
    expect(c.offset.dx).toBeCloseTo(0.0031, 10);
    expect(c.offset.dy).toBeCloseTo(-0.0023, 10);
    expect(Math.abs(c.offset.deltaUvPrime - 0.003033)).toBeLessThan(2e-6);
  });
  it('steps use the ellipse at the predicted CCT (about 3045 K: between the F3000 and F3500 rows)', () => {
    expect(c.predicted.cct).toBeGreaterThan(3000);
    expect(c.predicted.cct).toBeLessThan(3100);
    expect(c.offset.steps).toBeCloseTo(colourDistance(0.437, 0.401, c.predicted).steps, 12);
    expect(c.measured.cct).toBeGreaterThan(c.predicted.cct - 200);
  });
});

describe('plot outlines', () => {
  const t = qualityTarget({ kind: 'ansiBin', nominalCct: 3000 });
  it('every point of an n-step ellipse outline is n steps from its centre', () => {
    for (const [x, y] of ellipseOutline(stepEllipseAt(t), 3)) expect(colourDistance(x, y, t).steps).toBeCloseTo(3, 9);
  });
  it('a Δu′v′ outline is a circle of that radius in u′v′', () => {
    for (const [x, y] of toleranceOutline(t, { kind: 'deltaUvPrime', value: 0.004 }))
      expect(colourDistance(x, y, t).deltaUvPrime).toBeCloseTo(0.004, 9);
  });
  it('the quadrangle outline is closed and the locus runs from warm (high x) to cool', () => {
    const q = quadrangleOutline(t.ansiBin!);
    expect(q).toHaveLength(5);
    expect(q[4]).toEqual(q[0]);
    const locus = planckianOutline(2000, 8000);
    expect(locus[0][0]).toBeGreaterThan(locus[locus.length - 1][0]);
  });
});
