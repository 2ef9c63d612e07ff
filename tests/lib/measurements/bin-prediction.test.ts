/**
 * A batch built with a chip bin's recipe is compared with that bin's predicted point, not the
 * revision's. Steps: MacAdam-type steps of the 1-step ellipse at the predicted CCT (IEC 60081 ellipses
 * as in aim/distance.ts); points on the n-step outline are n steps away by construction of the ellipse.
 */
import { describe, expect, it } from 'vitest';
import { stepEllipseAt } from '../../../src/lib/aim/index';
import { batchPrediction, ellipseOutline, recordMeasurementSummary, stepsFromPrediction } from '../../../src/lib/measurements/index';
import { parseRecipe } from '../../../src/lib/recipe';
import { MATRIX_BINS, NOMINAL_CONTENT, withRecipeMatrix } from '../../fixtures/recipe-matrix';

// Target: ANSI C78.377-2017 3000 K centre (x 0.4339, y 0.4033).
const content = withRecipeMatrix(parseRecipe({ ...NOMINAL_CONTENT, target: { kind: 'xy', x: 0.4339, y: 0.4033 } }));
// The revision's own prediction, deliberately away from every bin's point.
const revisionPoint = { x: 0.44, y: 0.41 };
const b3 = MATRIX_BINS[2].predicted;

describe("the batch's prediction", () => {
  it("uses the chip bin's predicted point and names the bin", () => {
    const p = batchPrediction(content, 2, revisionPoint, 'B3')!;
    expect(p.source).toBe('bin');
    expect([p.point.x, p.point.y]).toEqual([b3.x, b3.y]);
    expect(p.label).toBe('chip bin B3 (452.5–455 nm peak) of revision 2');
  });

  it("falls back to the revision's prediction without a chip bin, and to none without either", () => {
    expect(batchPrediction(content, 2, revisionPoint, null)).toMatchObject({
      source: 'revision',
      label: 'revision 2',
      point: revisionPoint
    });
    expect(batchPrediction(parseRecipe({ ...content, binRecipes: [] }), 2, null, null)).toBeNull();
  });

  it("parts on the bin's 2-step ellipse are 2 steps from its prediction; a part at its point is 0", () => {
    const p = batchPrediction(content, 2, revisionPoint, 'b3')!;
    const ring = ellipseOutline(stepEllipseAt(p.point), 2).map(([x, y]) => ({ x, y }));
    for (const s of stepsFromPrediction(ring, p)) expect(s).toBeCloseTo(2, 9);
    expect(stepsFromPrediction([{ x: b3.x, y: b3.y }], p)[0]).toBe(0);
    // The same part is not 0 steps from the revision's own prediction.
    expect(stepsFromPrediction([{ x: b3.x, y: b3.y }], batchPrediction(content, 2, revisionPoint, null)!)[0]).toBeGreaterThan(1);
  });

  it('the batch report names the prediction compared', () => {
    const summary = { parts: 0, passed: 0, yieldFraction: null, stats: {}, meanOffset: null, bins: [] } as never;
    const acceptance = { tolerance: { kind: 'sdcm' as const, steps: 3 }, floors: {}, requireTargetBin: false };
    const r = recordMeasurementSummary(summary, acceptance, '3000 K', null, null, 'chip bin B3 (452.5–455 nm peak) of revision 2');
    expect(r.rows).toContainEqual({
      label: 'Prediction compared',
      value: 'predicted point of chip bin B3 (452.5–455 nm peak) of revision 2'
    });
  });
});
