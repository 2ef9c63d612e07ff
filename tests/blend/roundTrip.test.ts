import { describe, expect, it } from 'vitest';
import { evaluateGrid } from '../../src/lib/spectral/evaluate';
import { prepareBasis } from '../../src/lib/blend/basis';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { superposeSpd } from '../../src/lib/blend/superposition';
import { THREE, FOUR, blue } from './fixtures';

// Source: XYZ is linear in the spectrum (CIE 15:2004 §7, tristimulus integrals); a mix
// built from known ratios has a colour point the solver must hit again [common practice].
const cases = [
  {
    name: 'pump + 2 phosphors (exact solve)',
    comps: blue('ph-yg555', 'ph-rd625'),
    w: [0.12, 0.55, 0.33],
    tol: 1e-4,
    source: 'common practice'
  },
  { name: 'pump + 3 phosphors', comps: THREE, w: [0.07, 0.2, 0.27, 0.46], tol: 1e-4, source: 'common practice' },
  { name: 'pump + 4 phosphors', comps: FOUR, w: [0.08, 0.15, 0.3, 0.37, 0.1], tol: 1e-4, source: 'common practice' }
];

describe('round trip: SPD from known ratios → solver hits its colour point', () => {
  for (const c of cases) {
    it(c.name, () => {
      const basis = prepareBasis(c.comps);
      const ev = evaluateGrid(superposeSpd(basis, c.w), { cri: false, tm30: false });
      const r = solveBlend({ components: c.comps, target: { kind: 'xy', x: ev.x, y: ev.y }, objective: 'maxLer' });
      expect(r.status).toBe('ok');
      expect(r.candidates.length).toBeGreaterThan(0);
      for (const cand of r.candidates) {
        expect(Math.abs(cand.evaluation.x - ev.x)).toBeLessThan(c.tol);
        expect(Math.abs(cand.evaluation.y - ev.y)).toBeLessThan(c.tol);
        expect(cand.opticalFractions.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
        expect(Math.min(...cand.opticalFractions)).toBeGreaterThanOrEqual(0);
      }
    });
  }

  it('pump + 2 phosphors recovers the ratios themselves (unique solution)', () => {
    // Source: 3 linear equations in 3 unknowns (Ohno 2005) [from memory].
    const c = cases[0];
    const basis = prepareBasis(c.comps);
    const ev = evaluateGrid(superposeSpd(basis, c.w), { cri: false, tm30: false });
    const r = solveBlend({ components: c.comps, target: { kind: 'xy', x: ev.x, y: ev.y }, objective: 'maxLer' });
    r.candidates[0].opticalFractions.forEach((w, i) => expect(Math.abs(w - c.w[i])).toBeLessThan(1e-4));
  });
});
