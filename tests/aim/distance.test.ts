import { describe, expect, it } from 'vitest';
import { colourDistance, stepEllipseAt } from '../../src/lib/aim/index';
import type { ChromaticityEllipse } from '../../src/lib/spectral/index';

// Steps by the ellipse metric n = √(g11Δx² + 2g12ΔxΔy + g22Δy²) (MacAdam, JOSA 32:247, 1942), which
// equals √((u/a)² + (v/b)²) with u = Δx·cosθ + Δy·sinθ, v = −Δx·sinθ + Δy·cosθ (rotation into the axes).

// Published ellipse: ANSI 2700 K centre (0.4578, 0.4101), 3-step semi-axes a = 0.00810, b = 0.00420,
// θ = 53.7° — seen on an LED package datasheet . 1-step: a = 0.0027, b = 0.0014.
const ANSI_2700_3STEP: ChromaticityEllipse = { name: 'ANSI 2700 K 3-step', nominalCct: 2700, x: 0.4578, y: 0.4101, a: 0.0081, b: 0.0042, thetaDeg: 53.7, steps: 3 };
const centre = { x: 0.4578, y: 0.4101, cct: 2725 };
// cos 53.7° = 0.592013, sin 53.7° = 0.805928.
const C = 0.592013;
const S = 0.805928;

describe('steps from the published ANSI 2700 K 3-step ellipse, worked by hand', () => {
  const cases = [
    // 2 steps along the major axis: Δ = 2·0.0027·(cosθ, sinθ) = (0.0031969, 0.0043520) → n = 2.
    { name: 'two steps on the major axis', d: [2 * 0.0027 * C, 2 * 0.0027 * S], expected: 2, tol: 1e-4 },
    // 1 step along the minor axis: Δ = 0.0014·(−sinθ, cosθ) → n = 1.
    { name: 'one step on the minor axis', d: [-0.0014 * S, 0.0014 * C], expected: 1, tol: 1e-4 },
    // Δ = (+0.0030, +0.0010): u = 0.0030·0.592013 + 0.0010·0.805928 = 0.0025820,
    // v = −0.0030·0.805928 + 0.0010·0.592013 = −0.0018258; u/a = 0.95628, v/b = −1.30412;
    // n = √(0.91448 + 1.70074) = √2.61522 = 1.6172.
    { name: 'Δ = (+0.0030, +0.0010)', d: [0.003, 0.001], expected: 1.6172, tol: 1e-4 },
    // Δ = (−0.0020, +0.0025): u = −0.0011840 + 0.0020148 = 0.0008308, v = 0.0016119 + 0.0014800 = 0.0030919;
    // u/a = 0.30770, v/b = 2.20849; n = √(0.09468 + 4.87745) = √4.97213 = 2.2298.
    { name: 'Δ = (−0.0020, +0.0025)', d: [-0.002, 0.0025], expected: 2.2298, tol: 1e-4 }
  ];
  it.each(cases)('$name', ({ d, expected, tol }) => {
    const o = colourDistance(centre.x + d[0], centre.y + d[1], centre, ANSI_2700_3STEP);
    expect(o.steps).toBeCloseTo(expected, 3);
    expect(Math.abs(o.steps - expected)).toBeLessThanOrEqual(tol);
    expect(o.dx).toBeCloseTo(d[0], 12);
    expect(o.dy).toBeCloseTo(d[1], 12);
  });
});

describe('default ellipse: IEC 60081 F3000 1-step (a = 0.00278, b = 0.00136, θ = 53.13°; from memory)', () => {
  // At a 3000 K centre the ellipse is the F3000 row itself (no interpolation). cos 53.13° ≈ 0.6, sin ≈ 0.8.
  // Δ = (+0.002, −0.001): u = 0.0012 − 0.0008 = 0.0004, v = −0.0016 − 0.0006 = −0.0022;
  // n = √((0.0004/0.00278)² + (0.0022/0.00136)²) = √(0.020703 + 2.616782) = √2.637485 = 1.6240.
  const c3000 = { x: 0.44, y: 0.403, cct: 3000 };
  it('takes the F3000 shape at 3000 K', () => {
    const e = stepEllipseAt(c3000);
    expect([e.a, e.b, e.thetaDeg]).toEqual([0.00278, 0.00136, 53.13]);
  });
  it('Δ = (+0.002, −0.001) is 1.624 steps', () => {
    expect(colourDistance(0.442, 0.402, c3000).steps).toBeCloseTo(1.624, 3);
  });
});
