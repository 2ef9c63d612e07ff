import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { blue, FOUR, THREE } from './fixtures';
import { floorsInside } from '../../src/lib/aim/floors';
import { mix } from '../../src/lib/blend/mix';
import { roundedShares } from '../../src/lib/designer/shares';

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

  it('a proposal still meets its floors once its fractions are rounded to 4 decimals for filing', () => {
    // 90 CRI class, Ra ≥ 90 and R9 ≥ 50 (common practice); maximising LER presses R9 onto its floor.
    const components = blue('ph-gl530', 'ph-yl568', 'ph-rd625');
    const floors = { raMin: 90, r9Min: 50 };
    const r = solveBlend({ components, target: { kind: 'cctDuv', cct: 3000, duv: 0 }, floors, objective: 'maxLer' });
    expect(r.status).toBe('ok');
    for (const c of r.candidates) {
      const filed = mix(components, { kind: 'optical', fractions: roundedShares(c.opticalFractions, 4) });
      expect(filed.evaluation.cri.ra).toBeGreaterThanOrEqual(90);
      expect(filed.evaluation.cri.ri[8]).toBeGreaterThanOrEqual(50);
    }
  });
});

describe('floorsInside', () => {
  it('raises minimums and lowers the Rg maximum by the margin, and adds no floor', () => {
    // Arithmetic on the limits (common practice): 90 + 0.05, 104 − 0.05.
    expect(floorsInside({ raMin: 90, r9Min: 50, rgMax: 104 }, 0.05)).toEqual({ raMin: 90.05, r9Min: 50.05, rgMax: 103.95 });
    expect(floorsInside({}, 0.05)).toEqual({});
  });

  it('moves melanopic DER limits by the margin in DER units (0.05 points = 0.0005 DER)', () => {
    // Arithmetic on the limits (common practice): shortfalls weigh 100 per unit DER, so 0.05 / 100 = 0.0005.
    const f = floorsInside({ melDerMin: 0.3, melDerMax: 0.45 }, 0.05);
    expect(f.melDerMin).toBeCloseTo(0.3005, 12);
    expect(f.melDerMax).toBeCloseTo(0.4495, 12);
  });
});
