import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { FOUR, THREE } from './fixtures';

// Property: whatever the target and floors, a candidate marked feasible meets every floor
// with the core's own metrics, and status 'ok' returns only feasible candidates [common practice].
describe('every returned candidate meets its floors', () => {
  it('random targets and floors, 3 and 4 phosphors', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(THREE, FOUR),
        fc.integer({ min: 2700, max: 6500 }),
        fc.double({ min: -0.004, max: 0.004, noNaN: true }),
        fc.integer({ min: 70, max: 95 }),
        fc.integer({ min: -20, max: 70 }),
        fc.option(fc.integer({ min: 70, max: 92 }), { nil: undefined }),
        (comps, cct, duv, raMin, r9Min, rfMin) => {
          const floors = { raMin, r9Min, rfMin };
          const r = solveBlend({ components: comps, target: { kind: 'cctDuv', cct, duv }, floors, objective: 'maxLer', maxCandidates: 2 });
          if (r.status === 'ok') expect(r.candidates.length).toBeGreaterThan(0);
          for (const c of r.candidates) {
            if (!c.feasible) {
              expect(r.status).not.toBe('ok');
              continue;
            }
            expect(c.evaluation.cri.ra).toBeGreaterThanOrEqual(raMin);
            expect(c.evaluation.cri.ri[8]).toBeGreaterThanOrEqual(r9Min);
            if (rfMin !== undefined) expect(c.evaluation.tm30.rf).toBeGreaterThanOrEqual(rfMin);
            expect(c.chromaticityError.deltaUvPrime).toBeLessThan(1e-6);
          }
        }
      ),
      { numRuns: 25, seed: 20240611 }
    );
  });

  it('Rg window and LER floor are honoured', () => {
    const floors = { raMin: 85, rgMin: 98, rgMax: 104, lerMin: 290 };
    const r = solveBlend({ components: FOUR, target: { kind: 'ansiBin', nominalCct: 4000 }, floors, objective: 'maxRf' });
    for (const c of r.candidates.filter((k) => k.feasible)) {
      expect(c.evaluation.tm30.rg).toBeGreaterThanOrEqual(98);
      expect(c.evaluation.tm30.rg).toBeLessThanOrEqual(104);
      expect(c.evaluation.ler).toBeGreaterThanOrEqual(290);
    }
    expect(['ok', 'floorsNotMet']).toContain(r.status);
  });
});
