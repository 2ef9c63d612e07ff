import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../src/lib/blend/basis';
import { correctRecipe } from '../../src/lib/blend/correction';
import { correctBatch } from '../../src/lib/blend/correctBatch';
import { CorrectionRefusedError, trimCap } from '../../src/lib/blend/correctionLimits';
import { resolveTarget } from '../../src/lib/aim';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { THREE } from './fixtures';

// Measure → correct with a damped Jacobian step [common practice]: a trim that cannot reach the
// target, or only by taking a phosphor to nothing, is refused rather than handed over; a trim is
// applied as a share of the full correction and the share says how much it was capped.
const target = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const basis = prepareBasis(THREE);
const w = solveBlend({ components: THREE, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' })
  .candidates[0].opticalFractions;
// A gross offset towards blue-violet: no positive amounts of these phosphors reach the target with that bias.
const gross = [{ x: target.x - 0.1, y: target.y - 0.1 }];

describe('trim cap: share of the full correction in log-amounts', () => {
  // Expected shares worked out by hand: a change limit of ×2 allows |s| ≤ ln 2.
  const cases = [
    { name: 'small full trim', s: [0.1, -0.05], step: 1, share: 1, by: 'none' },
    { name: 'step share asked for', s: [0.1, -0.05], step: 0.8, share: 0.8, by: 'stepFraction' },
    { name: '×3 needed, ×2 allowed', s: [Math.log(3), 0], step: 1, share: Math.log(2) / Math.log(3), by: 'maxChange' },
    { name: '÷4 needed at step 0.8', s: [0, -Math.log(4)], step: 0.8, share: 0.5, by: 'maxChange' }
  ] as const;
  for (const c of cases) {
    it(c.name, () => {
      const cap = trimCap([...c.s], c.step);
      expect(cap.appliedShare).toBeCloseTo(c.share, 12);
      expect(cap.limitedBy).toBe(c.by);
      expect(cap.requestedShare).toBe(c.step);
    });
  }
});

describe('correction refusals', () => {
  it('a gross offset that needs a phosphor below zero is refused, naming it', () => {
    const res = correctRecipe(basis, { kind: 'optical', fractions: w }, gross, target);
    expect(res.refusal?.reason).toBe('belowZero');
    expect(res.refusal?.message).toMatch(/to zero or below/);
    expect(THREE.phosphors.some((p) => res.refusal!.message.includes(p.name))).toBe(true);
    expect(() =>
      correctBatch({
        components: THREE,
        recipe: { kind: 'optical', fractions: w },
        measured: { kind: 'xy', points: gross },
        target: { kind: 'ansiBin', nominalCct: 3000 }
      })
    ).toThrow(CorrectionRefusedError);
  });

  it('an iteration stopped before it lands is refused as not converged', () => {
    const res = correctRecipe(basis, { kind: 'optical', fractions: w }, [{ x: target.x + 0.004, y: target.y - 0.003 }], target, {
      maxIterations: 1
    });
    expect(res.converged).toBe(false);
    expect(res.refusal?.reason).toBe('notConverged');
    expect(res.refusal?.message).toMatch(/does not converge: after 1 iterations the model is still \d+\.\d steps from target/);
  });

  it('a small offset is not refused, and the applied share is the one asked for', () => {
    const res = correctRecipe(basis, { kind: 'optical', fractions: w }, [{ x: target.x + 0.004, y: target.y - 0.003 }], target, {
      stepFraction: 0.8
    });
    expect(res.refusal).toBeNull();
    expect(res.cap).toEqual({ requestedShare: 0.8, appliedShare: 0.8, limitedBy: 'stepFraction', maxTrimFactor: 2 });
  });

  it('a trim limited to ×2 per phosphor says so, and no multiplier leaves [½, 2]', () => {
    // 0.1 in y too green: the full correction needs more than a factor 2 on some phosphor.
    const res = correctRecipe(basis, { kind: 'optical', fractions: w }, [{ x: target.x + 0.1, y: target.y + 0.05 }], target);
    expect(res.refusal).toBeNull();
    expect(res.cap.limitedBy).toBe('maxChange');
    expect(res.cap.appliedShare).toBeLessThan(1);
    for (const m of res.multipliers) {
      expect(m).toBeGreaterThanOrEqual(0.5 - 1e-12);
      expect(m).toBeLessThanOrEqual(2 + 1e-12);
    }
    expect(Math.min(...res.multipliers)).toBeCloseTo(0.5, 9);
    // The expected point is honest about what is left: still off target.
    expect(res.errorAfter.steps).toBeGreaterThan(1);
  });
});
