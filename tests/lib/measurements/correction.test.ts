import { describe, expect, it } from 'vitest';
import { correctFromBatch, judgeBatch, partMetrics, revisionRecipe } from '../../../src/lib/measurements/index';
import { mix } from '../../../src/lib/blend/mix';
import { prepareBasis, tristimulus } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { resolveTarget } from '../../../src/lib/aim/index';
import { xyOf } from '../../../src/lib/blend/superposition';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend/demo-components';
import type { BlendComponents } from '../../../src/lib/blend/types';
import type { RevisionContent } from '../../../src/lib/recipe';
import { xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';
import { metricsAt } from './support';

// Measure → correct loop (common practice): Δ = target − measured mean, model
// Jacobian, damped step; the blend solver's `correctBatch` does the step, quality feeds it the
// measured mean of a synthetic batch built with a known bias and checks the predicted point moves
// toward the target. Components are the invented demo set (green, yellow-green, red on a 450 nm chip).
const components: BlendComponents = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
const target = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const solved = solveBlend({ components, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' })
  .candidates[0];
const w = solved.opticalFractions;
const loading = { pathLengthMm: 0.3 };
const basis = prepareBasis(components);
const wt = concentrationsForFractions(basis.loading!, w, loading).concentrationsWtPct;

function content(withLoading: boolean): RevisionContent {
  return {
    contentVersion: 1,
    pump: { materialId: 1, code: 'B-450', name: 'B-450 royal blue chip' },
    phosphors: components.phosphors.map((p, i) => ({
      materialId: i + 2,
      code: p.name.split(' ')[0],
      name: p.name,
      opticalFraction: w[i + 1],
      wtPct: withLoading ? wt[i] : null
    })),
    pumpLeakFraction: w[0],
    loading: withLoading ? { ...loading, basis: 'wtPctOfSlurry' } : null,
    silicone: {
      siliconeSystemId: null,
      name: 'Brackenfield 1:1 optical silicone',
      ratioA: 1,
      ratioB: 1,
      potLifeMin: 240,
      cure: '1 h 100 °C + 2 h 150 °C',
      densityGPerCm3: 1.1
    },
    target: { kind: 'ansiBin', nominalCct: 3000 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 90 },
    notes: 'first build'
  };
}
const duvp = (a: { x: number; y: number }, b: { x: number; y: number }) => {
  const [u1, v1] = xyToUvPrime(a.x, a.y);
  const [u0, v0] = xyToUvPrime(b.x, b.y);
  return Math.hypot(u1 - u0, v1 - v0);
};

describe('correction of a synthetic batch with a known constant colour bias (optical recipe)', () => {
  // The line builds every part at model point + (+0.004, −0.003) in x,y, with symmetric scatter of ±0.001.
  const model = mix(components, { kind: 'optical', fractions: w }).evaluation;
  const bias = { x: 0.004, y: -0.003 };
  const scatter = [
    [0.001, 0],
    [-0.001, 0],
    [0, 0.001],
    [0, -0.001],
    [0, 0]
  ];
  const parts = scatter.map(([ex, ey], i) => ({ label: `P${i + 1}`, metrics: metricsAt(model.x + bias.x + ex, model.y + bias.y + ey) }));
  const mean = judgeBatch(
    parts,
    { kind: 'ansiBin', nominalCct: 3000 },
    { tolerance: { kind: 'sdcm', steps: 3 }, floors: {}, requireTargetBin: true }
  ).summary.meanPoint!;

  it('uses the optical recipe when the revision has no loading model', () => {
    expect(revisionRecipe(content(false), components).kind).toBe('optical');
  });

  it('full step: the bias is recovered and the predicted point lands on the target', () => {
    const { response, content: next } = correctFromBatch(content(false), components, mean, 'Correction from batch KH-B-0001', 1);
    expect(response.bias.dx).toBeCloseTo(bias.x, 6);
    expect(response.bias.dy).toBeCloseTo(bias.y, 6);
    expect(duvp(response.predicted, target)).toBeLessThan(1e-5);
    // Rebuilt on the biased line: the new fractions' model point plus the bias hits the target.
    const fr = [next.pumpLeakFraction, ...next.phosphors.map((p) => p.opticalFraction)];
    const rebuilt = mix(components, { kind: 'optical', fractions: fr }).evaluation;
    expect(duvp({ x: rebuilt.x + bias.x, y: rebuilt.y + bias.y }, target)).toBeLessThan(1e-5);
    // The note says what was applied and which colour point to expect (here: the target itself, 0 steps away).
    expect(next.notes).toBe(
      `first build\n\nCorrection from batch KH-B-0001 Full correction applied; expect x ${target.x.toFixed(4)}, ` +
        `y ${target.y.toFixed(4)} (${Math.round(target.cct)} K, Duv ` +
        `${target.duv < 0 ? '−' : '+'}${Math.abs(target.duv).toFixed(4)}), 0.0 steps ` +
        `from target.`
    );
    expect(next.phosphors.every((p) => p.wtPct === null)).toBe(true);
  });

  it('damped step 0.8: the predicted point moves toward the target, leaving about a fifth of the error', () => {
    const { response } = correctFromBatch(content(false), components, mean, 'trim', 0.8);
    const before = duvp(mean, target);
    const after = duvp(response.predicted, target);
    expect(before).toBeGreaterThan(0.003);
    expect(after).toBeLessThan(0.35 * before);
    expect(after).toBeGreaterThan(0.05 * before);
    // Direction: the move from the measured mean has a positive component toward the target.
    const move = [response.predicted.x - mean.x, response.predicted.y - mean.y];
    const want = [target.x - mean.x, target.y - mean.y];
    expect(move[0] * want[0] + move[1] * want[1]).toBeGreaterThan(0);
  });
});

describe('correction with the loading model: the real line absorbs more red than the model (known bias)', () => {
  // "Real line": red absorbs 20 % more and green 10 % less than the model thinks.
  const trueAlpha = basis.loading!.absorptionPerWtPctMm.map((a, i) => a * [0.9, 1, 1.2][i]);
  const build = (c: number[]) => {
    const [x, y] = xyOf(tristimulus(beerLambertPhotonBudget({ ...basis.loading!, absorptionPerWtPctMm: trueAlpha }, c, 0.3).spd));
    return { x, y };
  };

  it('uses the loading recipe and, rebuilt on the biased line, the corrected recipe lands nearer the target', () => {
    expect(revisionRecipe(content(true), components).kind).toBe('loading');
    const measured = build(wt);
    expect(duvp(measured, target)).toBeGreaterThan(0.002);
    const { response, content: next } = correctFromBatch(content(true), components, measured, 'trim', 1);
    expect(response.recipe.kind).toBe('loading');
    const rebuilt = build(next.phosphors.map((p) => p.wtPct!));
    expect(duvp(rebuilt, target)).toBeLessThan(0.25 * duvp(measured, target));
    // The optical fractions written into the draft sum to 1 with the pump leak.
    const total = next.pumpLeakFraction + next.phosphors.reduce((a, p) => a + p.opticalFraction, 0);
    expect(total).toBeCloseTo(1, 5);
  });
});

describe('part metrics of a measured spectrum', () => {
  it('a blend spectrum gives all metrics, JSON-safe', () => {
    const spd = mix(components, { kind: 'optical', fractions: w }).spd;
    const m = partMetrics(spd);
    expect(m.ra).not.toBeNull();
    expect(m.criValid).toBe(true);
    expect(JSON.parse(JSON.stringify(m))).toEqual(m);
  });
});
