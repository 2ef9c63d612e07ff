/**
 * A correction from bench measurements of a revision aimed hot (85 °C junction: common practice for
 * hot binning) aims the hot point: with the full step, the corrected recipe evaluated at the
 * condition, plus the bias the bench showed, sits on the target within 0.5 MacAdam step (the check the
 * solver meets for a hot target), and the new cold check is the bench point that recipe should measure.
 * Thermal data and the bias are invented (tests/blend/thermal/fixtures.ts, [from memory] ranges).
 */
import { describe, expect, it } from 'vitest';
import { colourDistance } from '../../../src/lib/aim';
import { resolveTarget } from '../../../src/lib/aim/target';
import { mix } from '../../../src/lib/blend';
import { requireHotComponents } from '../../../src/lib/blend/thermal';
import { solveAtCondition } from '../../../src/lib/blend/solver/solveAtCondition';
import { correctFromBatchAtCondition } from '../../../src/lib/measurements/correction';
import type { RevisionContent } from '../../../src/lib/recipe';
import { COMPONENTS, TYPICAL } from '../../blend/thermal/fixtures';

const AT_3000 = { kind: 'ansiBin', nominalCct: 3000 } as const;
const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const loading = { pathLengthMm: 0.3 };
const BIAS = { x: 0.004, y: -0.003 };

function hotAimedContent() {
  const solved = solveAtCondition({
    components: COMPONENTS,
    target: AT_3000,
    objective: 'maxLer',
    loading,
    condition: HOT,
    thermal: TYPICAL
  });
  const c = solved.candidates[0];
  const content = {
    contentVersion: 3,
    pump: { materialId: 1, code: 'B-450', name: COMPONENTS.pump.name },
    phosphors: COMPONENTS.phosphors.map((p, i) => ({
      materialId: i + 2,
      code: p.id,
      name: p.name,
      opticalFraction: c.opticalFractions[i + 1],
      wtPct: c.concentrationsWtPct![i]
    })),
    pumpLeakFraction: c.opticalFractions[0],
    loading: { ...loading, basis: 'wtPctOfSlurry' },
    target: AT_3000,
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: {},
    condition: HOT,
    coldCheck: c.coldCheck,
    binRecipes: [],
    notes: ''
  } as unknown as RevisionContent;
  return { content, cold: c.coldCheck! };
}

describe('correction of a hot-aimed revision from bench measurements', () => {
  it('aims the hot point and gives the new cold check', () => {
    const { content, cold } = hotAimedContent();
    const hot = requireHotComponents(COMPONENTS, TYPICAL, HOT);
    const measured = { x: cold.x + BIAS.x, y: cold.y + BIAS.y };
    const r = correctFromBatchAtCondition(content, COMPONENTS, hot, measured, 'bench', 'Correction test.', 1);
    const wt = r.content.phosphors.map((p) => p.wtPct!);
    const hotPoint = mix(hot.components, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    const target = resolveTarget(AT_3000);
    expect(colourDistance(hotPoint.x + BIAS.x, hotPoint.y + BIAS.y, target).steps).toBeLessThan(0.5);
    // The new cold check: the bench model of the corrected recipe plus the bias, as the bench will measure it.
    const benchPoint = mix(COMPONENTS, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    expect(r.coldCheck.x).toBeCloseTo(benchPoint.x + BIAS.x, 5); // wt % are stored to 4 decimals
    expect(r.content.coldCheck).toEqual(r.coldCheck);
    expect(r.content.condition).toEqual(HOT);
    // Without a correction the bias would have put the hot point off target by the bias itself.
    expect(colourDistance(cold.x + BIAS.x, cold.y + BIAS.y, { ...target, x: cold.x, y: cold.y }).steps).toBeGreaterThan(1);
  });

  it('from parts measured at the condition, corrects the hot point directly', () => {
    const { content } = hotAimedContent();
    const hot = requireHotComponents(COMPONENTS, TYPICAL, HOT);
    const target = resolveTarget(AT_3000);
    const measured = { x: target.x + BIAS.x, y: target.y + BIAS.y };
    const r = correctFromBatchAtCondition(content, COMPONENTS, hot, measured, 'condition', 'Correction test.', 1);
    const wt = r.content.phosphors.map((p) => p.wtPct!);
    const hotPoint = mix(hot.components, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    const solvedHot = mix(hot.components, {
      kind: 'loading',
      concentrationsWtPct: content.phosphors.map((p) => p.wtPct!),
      loading
    }).evaluation;
    const bias = { x: measured.x - solvedHot.x, y: measured.y - solvedHot.y };
    expect(colourDistance(hotPoint.x + bias.x, hotPoint.y + bias.y, target).steps).toBeLessThan(0.5);
  });
});
