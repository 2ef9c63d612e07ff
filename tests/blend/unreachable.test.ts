import { describe, expect, it } from 'vitest';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { THREE, blue } from './fixtures';

// Source: a mix's chromaticity is a convex combination of the component chromaticities
// (Grassmann additivity, CIE 15:2004 §7.3) [common practice]: outside the hull → unreachable.
describe('targets outside the component gamut are reported, not faked', () => {
  it('warm white without a red phosphor is unreachable', () => {
    const r = solveBlend({ components: blue('ph-gl530', 'ph-yg555'), target: { kind: 'ansiBin', nominalCct: 3000 }, objective: 'maxLer' });
    expect(r.status).toBe('unreachable');
    expect(r.reason).toMatch(/outside the colour gamut/);
    expect(r.candidates.every((c) => !c.feasible)).toBe(true);
    // the best achievable point is strictly off target
    expect(r.candidates[0].chromaticityError.deltaUvPrime).toBeGreaterThan(0.001);
  });

  it('a saturated green point far outside the hull is unreachable', () => {
    const r = solveBlend({ components: THREE, target: { kind: 'xy', x: 0.2, y: 0.7 }, objective: 'maxLer' });
    expect(r.status).toBe('unreachable');
  });

  it('floors no mix can meet give floorsNotMet with best values', () => {
    // Source: Ra ≤ 100 by definition (CIE 13.3-1995 eq. 5–6); a Ra 99.5 floor with three broad
    // bands and a blue pump is far beyond typical pc-LEDs [from memory].
    const r = solveBlend({
      components: THREE,
      target: { kind: 'ansiBin', nominalCct: 3000 },
      floors: { raMin: 99.5 },
      objective: 'maxLer'
    });
    expect(r.status).toBe('floorsNotMet');
    expect(r.reason).toMatch(/Ra ≥ 99.5/);
    expect(r.bestAchievable.raMin).toBeLessThan(99.5);
    expect(r.candidates.every((c) => !c.feasible && c.violations.length > 0)).toBe(true);
  });

  it('rejects a problem with fewer than 2 phosphors', () => {
    expect(() => solveBlend({ components: blue('ph-yg555'), target: { kind: 'ansiBin', nominalCct: 5000 }, objective: 'maxLer' })).toThrow(
      /2–5 phosphors/
    );
  });
});
