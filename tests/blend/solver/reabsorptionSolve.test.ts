/**
 * What is shown is what will be weighed: with re-absorption on, every proposal's colour point
 * and metrics belong to the loading-model spectrum of the wt % it hands over.
 * Checks: the forward loading model at the handed-over wt % sits within 0.5 MacAdam step
 * (IEC 60081 ellipses, via the core's SDCM) of the proposal and on the target's colour point;
 * wt % scale as 1/L (Beer–Lambert exponent α·c·L).
 */
import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { LoadingRefusedError } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { colourDistance } from '../../../src/lib/aim';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { evaluateGrid } from '../../../src/lib/spectral/evaluate';
import { THREE, blue } from '../fixtures';

const YELLOW_RED = blue('ph-yl568', 'ph-rd625');
const AT_3000 = { kind: 'ansiBin', nominalCct: 3000 } as const;
const sets = [
  { name: 'garnet yellow + nitride red', components: YELLOW_RED, floors: {} },
  { name: 'garnet green + yellow-green + nitride red', components: THREE, floors: { raMin: 80 } }
];

describe('solve with re-absorption hands over wt % that reproduce the proposal', () => {
  for (const set of sets) {
    for (const L of [0.15, 0.3, 0.6]) {
      it(`${set.name} at ${L} mm, 3000 K bin`, () => {
        const loading = { pathLengthMm: L, cascade: true };
        const problem = { components: set.components, target: AT_3000, floors: set.floors, objective: 'maxLer' as const, maxCandidates: 5 };
        const res = solveBlend({ ...problem, loading });
        expect(res.model.kind).toBe('loadingWithReabsorption');
        expect(res.model.label).toBe(`loading model with re-absorption, ${L.toFixed(2)} mm`);
        expect(res.candidates.length).toBeGreaterThan(0);
        const lb = prepareBasis(set.components).loading!;
        for (const c of res.candidates) {
          const wt = c.concentrationsWtPct!;
          expect(wt.reduce((a, b) => a + b, 0)).toBeLessThan(100);
          const fwd = evaluateGrid(beerLambertPhotonBudget(lb, wt, L, true).spd, { cri: false, tm30: false });
          expect(colourDistance(fwd.x, fwd.y, c.evaluation).steps).toBeLessThan(0.5);
          // ANSI C78.377 3000 K centre (x 0.4339, y 0.4033): the proposal sits on it, not 20+ steps away.
          expect(c.chromaticityError.steps).toBeLessThan(0.5);
          expect(fwd.ler).toBeCloseTo(c.evaluation.ler, 6);
        }
      });
    }
  }

  it('floors are met on the light of the wt % handed over (Ra ≥ 90, R9 ≥ 50, CIE 13.3)', () => {
    const loading = { pathLengthMm: 0.3, cascade: true };
    const floors = { raMin: 90, r9Min: 50 };
    const res = solveBlend({ components: THREE, target: AT_3000, floors, objective: 'maxLer', maxCandidates: 5, loading });
    expect(res.status).toBe('ok');
    const lb = prepareBasis(THREE).loading!;
    for (const c of res.candidates) {
      const fwd = evaluateGrid(beerLambertPhotonBudget(lb, c.concentrationsWtPct!, 0.3, true).spd);
      expect(fwd.cri.ra).toBeGreaterThanOrEqual(90);
      expect(fwd.cri.ri[8]).toBeGreaterThanOrEqual(50);
    }
  });

  it('the two-phosphor recipe scales as 1/L (same optical depths at every path)', () => {
    const wtAt = (L: number) =>
      solveBlend({ components: YELLOW_RED, target: AT_3000, objective: 'maxLer', loading: { pathLengthMm: L, cascade: true } })
        .candidates[0].concentrationsWtPct!;
    const a = wtAt(0.3);
    const b = wtAt(0.6);
    a.forEach((v, i) => expect(b[i]).toBeCloseTo(v / 2, 6));
  });

  it('without re-absorption the proposals say they are optical superpositions', () => {
    const res = solveBlend({ components: YELLOW_RED, target: AT_3000, objective: 'maxLer', loading: { pathLengthMm: 0.3 } });
    expect(res.model.label).toBe('optical superposition; wt % from the loading model at 0.30 mm');
    expect(res.candidates[0].concentrationsWtPct).not.toBeNull();
  });

  it('a path too short for any proposal to stay under 100 wt % is refused with the reason', () => {
    const run = (cascade: boolean) => () =>
      solveBlend({ components: YELLOW_RED, target: AT_3000, objective: 'maxLer', loading: { pathLengthMm: 0.01, cascade } });
    for (const cascade of [false, true]) {
      expect(run(cascade)).toThrow(LoadingRefusedError);
      expect(run(cascade)).toThrow(/No proposal can be weighed.*100 wt %/);
    }
  });
});
