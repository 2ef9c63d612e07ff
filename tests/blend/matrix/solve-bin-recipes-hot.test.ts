/**
 * The recipe matrix of a revision aimed hot (85 °C junction: common practice for hot binning): each
 * chip bin's recipe, evaluated with that bin's pump at the condition, sits on the target within 0.5
 * MacAdam step (the solver's check for a hot target); with zero quenching and drift it is the bench
 * matrix exactly. Bins 2.5 nm wide (common practice); thermal data invented (fixtures, [from memory] ranges).
 */
import { describe, expect, it } from 'vitest';
import { colourDistance } from '../../../src/lib/aim';
import { resolveTarget } from '../../../src/lib/aim/target';
import { mix } from '../../../src/lib/blend';
import { requireHotComponents } from '../../../src/lib/blend/thermal';
import { solveBinRecipes } from '../../../src/lib/blend/matrix/solveBinRecipes';
import { binPump } from '../../../src/lib/blend/matrix/binPump';
import { COMPONENTS, NEUTRAL, TYPICAL } from '../thermal/fixtures';

const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const target = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const loading = { pathLengthMm: 0.3 };
const nominal = { kind: 'loading' as const, concentrationsWtPct: [6, 2], loading };
const bins = [
  { code: 'B3', fromNm: 445, toNm: 447.5 },
  { code: 'B5', fromNm: 450, toNm: 452.5 }
];

describe('recipe matrix at an operating condition', () => {
  it('puts each bin on the target when evaluated hot', () => {
    const results = solveBinRecipes(COMPONENTS, nominal, target, bins, 'peak', { thermal: TYPICAL, condition: HOT });
    results.forEach((r, i) => {
      expect(r.refusal).toBeNull();
      const moved = binPump(COMPONENTS.pump, (bins[i].fromNm + bins[i].toNm) / 2, 'peak').pump;
      const hot = requireHotComponents({ ...COMPONENTS, pump: moved }, TYPICAL, HOT);
      const e = mix(hot.components, { kind: 'loading', concentrationsWtPct: r.wtPct!, loading }).evaluation;
      expect(colourDistance(e.x, e.y, target).steps).toBeLessThan(0.5);
      expect(r.predicted.x).toBeCloseTo(e.x, 9); // the stored prediction is the hot point
    });
  });

  it('with zero quenching and zero drift equals the bench matrix', () => {
    const bench = solveBinRecipes(COMPONENTS, nominal, target, bins, 'peak');
    const neutral = solveBinRecipes(COMPONENTS, nominal, target, bins, 'peak', { thermal: NEUTRAL, condition: HOT });
    neutral.forEach((r, i) => r.wtPct!.forEach((w, k) => expect(w).toBeCloseTo(bench[i].wtPct![k], 9)));
  });
});
