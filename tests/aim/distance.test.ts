import { describe, expect, it } from 'vitest';
import { colourDistance, resolveTarget, stepEllipseAt, withinTolerance } from '../../src/lib/aim/index';
import { uvToCct, xyToUv, type ChromaticityEllipse } from '../../src/lib/spectral/index';

// Steps by the ellipse metric n = √(g11Δx² + 2g12ΔxΔy + g22Δy²) (MacAdam, JOSA 32:247, 1942), which
// equals √((u/a)² + (v/b)²) with u = Δx·cosθ + Δy·sinθ, v = −Δx·sinθ + Δy·cosθ (rotation into the axes).

// Published ellipse: ANSI 2700 K centre (0.4578, 0.4101), 3-step semi-axes a = 0.00810, b = 0.00420,
// θ = 53.7° — seen on an LED package datasheet . 1-step: a = 0.0027, b = 0.0014.
const ANSI_2700_3STEP: ChromaticityEllipse = {
  name: 'ANSI 2700 K 3-step',
  nominalCct: 2700,
  x: 0.4578,
  y: 0.4101,
  a: 0.0081,
  b: 0.0042,
  thetaDeg: 53.7,
  steps: 3
};
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

describe('Δu′v′ and Δuv from the CIE formulas, worked by hand', () => {
  // CIE 15:2004 eq. 8.1–8.2: u′ = 4x/(−2x + 12y + 3), v′ = 9y/(−2x + 12y + 3); CIE 1960: u = u′, v = 6y/(−2x + 12y + 3).
  // Centre: the ANSI C78.377-2015 3000 K centre (0.4339, 0.4033); point (0.4400, 0.4033).
  // Denominators 6.9718 (centre) and 6.9596 (point); u′ 0.248946 → 0.252888, v′ 0.520626 → 0.521539,
  // v 0.347084 → 0.347692. Δu′v′ = √(0.0039423² + 0.0009126²) = 0.0040466; Δuv = √(0.0039423² + 0.0006084²) = 0.0039890.
  const centre = { x: 0.4339, y: 0.4033, cct: 3045 };
  const d = colourDistance(0.44, 0.4033, centre);
  it('Δu′v′ = 0.0040466', () => expect(d.deltaUvPrime).toBeCloseTo(0.0040466, 7));
  it('Δuv = 0.0039890', () => expect(d.deltaUv).toBeCloseTo(0.003989, 7));
  it('dx, dy are the plain x,y differences', () => {
    expect(d.dx).toBeCloseTo(0.0061, 12);
    expect(d.dy).toBeCloseTo(0, 12);
  });
  it('the centre itself is 0 in every unit', () => {
    expect(colourDistance(centre.x, centre.y, centre)).toEqual({ dx: 0, dy: 0, deltaUvPrime: 0, deltaUv: 0, steps: 0 });
  });
});

// The solver once took the ellipse shape at a CCT recomputed from the target's x,y, quality at the CCT the
// target states (for an ANSI bin the Table 1 target CCT). One function now takes the stated CCT, so the
// designer, the revision and the batch report quote the same steps for the same point.
describe('the ellipse shape follows the CCT the target states', () => {
  // IEC 60081 1-step ellipses (from memory): the 2700 K and 6500 K shapes differ in size and angle, so
  // the same offset counts differently around the same x,y when a different CCT is stated.
  it('same x,y, different stated CCT → different steps', () => {
    const at2700 = colourDistance(0.44, 0.405, { x: 0.4378, y: 0.4041, cct: 2700 }).steps;
    const at6500 = colourDistance(0.44, 0.405, { x: 0.4378, y: 0.4041, cct: 6500 }).steps;
    expect(Math.abs(at2700 - at6500)).toBeGreaterThan(0.1);
  });
  // ANSI C78.377-2017 Table 1: each nominal bin centre lies at its target CCT (within 1 %, far inside the
  // table's ±ΔT); the stated and the recomputed CCT then give the same steps to within 1e-4, far below the
  // 0.1 step to which steps are quoted [common practice].
  it.each([2700, 3000, 3500, 4000, 4500, 5000, 5700, 6500])('ANSI %i K bin: stated vs recomputed CCT agree to 1e-4 steps', (nominalCct) => {
    const t = resolveTarget({ kind: 'ansiBin', nominalCct });
    const recomputed = uvToCct(...xyToUv(t.x, t.y)).cct;
    expect(Math.abs(recomputed - t.cct) / t.cct).toBeLessThan(0.01);
    const e = stepEllipseAt(t);
    const th = (e.thetaDeg * Math.PI) / 180;
    const [x, y] = [t.x + 3 * e.a * Math.cos(th), t.y + 3 * e.a * Math.sin(th)];
    const stated = colourDistance(x, y, t).steps;
    const other = colourDistance(x, y, { ...t, cct: recomputed }).steps;
    expect(stated).toBeCloseTo(3, 9);
    expect(Math.abs(stated - other)).toBeLessThan(1e-4);
  });
});

// One tolerance judgement for the solver, the designer, the revision and quality: a distance on the
// tolerance counts as within it [common practice: a limit "≤ n" includes n].
describe('within tolerance, in the tolerance’s own units', () => {
  const centre = { x: 0.4339, y: 0.4033, cct: 3045 };
  const d = colourDistance(0.44, 0.4033, centre);
  it.each([
    { name: 'steps: on the limit is within', t: { kind: 'sdcm' as const, steps: d.steps }, within: true },
    { name: 'steps: just past the limit is outside', t: { kind: 'sdcm' as const, steps: d.steps * (1 - 1e-6) }, within: false },
    { name: 'Δu′v′ 0.0041 holds 0.0040466', t: { kind: 'deltaUvPrime' as const, value: 0.0041 }, within: true },
    { name: 'Δu′v′ 0.0040 does not', t: { kind: 'deltaUvPrime' as const, value: 0.004 }, within: false },
    { name: 'Δuv 0.0040 holds 0.0039890', t: { kind: 'deltaUv' as const, value: 0.004 }, within: true },
    { name: 'Δuv 0.0039 does not', t: { kind: 'deltaUv' as const, value: 0.0039 }, within: false }
  ])('$name', ({ t, within }) => expect(withinTolerance(d, t)).toBe(within));
});
