/**
 * A batch weighed for one chip bin is corrected from that bin's recipe on the pump at the bin's centre
 * (what the line built): with the full step, that bin's corrected recipe plus the bias the batch showed
 * lands on the target within 0.5 MacAdam step (the solver's own check); the nominal recipe and the other
 * bins stay as they were. Bins 2.5 nm wide (common practice); bias and materials invented (fixtures).
 */
import { describe, expect, it } from 'vitest';
import { colourDistance } from '../../../src/lib/aim';
import { resolveTarget } from '../../../src/lib/aim/target';
import { mix } from '../../../src/lib/blend';
import { solveBinRecipes } from '../../../src/lib/blend/matrix/solveBinRecipes';
import { binPump } from '../../../src/lib/blend/matrix/binPump';
import { correctBinFromBatch } from '../../../src/lib/measurements/correction-bin';
import { parseRecipe, type RevisionContent } from '../../../src/lib/recipe';
import { COMPONENTS } from '../../blend/thermal/fixtures';

const AT_3000 = { kind: 'ansiBin', nominalCct: 3000 } as const;
const target = resolveTarget(AT_3000);
const loading = { pathLengthMm: 0.3 };
const nominalWt = [6, 2];
const bins = [
  { code: 'B3', fromNm: 445, toNm: 447.5 },
  { code: 'B5', fromNm: 450, toNm: 452.5 }
];
const BIAS = { x: 0.003, y: -0.002 };

function matrixContent(): RevisionContent {
  const solved = solveBinRecipes(COMPONENTS, { kind: 'loading', concentrationsWtPct: nominalWt, loading }, target, bins, 'peak');
  const phosphor = (i: number, wt: number) => ({
    materialId: i + 2,
    code: COMPONENTS.phosphors[i].id,
    name: 'p',
    opticalFraction: 0.3,
    wtPct: wt
  });
  return parseRecipe({
    contentVersion: 3,
    pump: { materialId: 1, code: 'B-450', name: COMPONENTS.pump.name },
    phosphors: nominalWt.map((w, i) => phosphor(i, w)),
    pumpLeakFraction: 0.4,
    loading: { ...loading, basis: 'wtPctOfSlurry' },
    silicone: {
      siliconeSystemId: 1,
      name: 'Test 10:1',
      ratioA: 10,
      ratioB: 1,
      potLifeMin: 240,
      cure: '1 h at 150 °C',
      densityGPerCm3: 1.05
    },
    target: AT_3000,
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: {},
    notes: '',
    packageModelRef: null,
    condition: null,
    coldCheck: null,
    binRecipes: solved.map((r, k) => ({
      bin: { code: r.code, basis: 'peak', fromNm: bins[k].fromNm, toNm: bins[k].toNm, sharePct: null },
      pumpLeakFraction: r.opticalFractions[0],
      phosphors: r.wtPct!.map((w, i) => ({ ...phosphor(i, Number(w.toFixed(4))), opticalFraction: r.opticalFractions[i + 1] })),
      predicted: { ...r.predicted }
    }))
  });
}

describe("correction of a chip bin's batch", () => {
  it("starts from the bin's recipe, lands that bin on target with the batch's bias, and leaves the rest", () => {
    const content = matrixContent();
    const b5 = content.binRecipes![1];
    const pump = binPump(COMPONENTS.pump, 451.25, 'peak').pump;
    const bench = { ...COMPONENTS, pump };
    const model = mix(bench, { kind: 'loading', concentrationsWtPct: b5.phosphors.map((p) => p.wtPct!), loading }).evaluation;
    const measured = { x: model.x + BIAS.x, y: model.y + BIAS.y };
    const r = correctBinFromBatch(content, COMPONENTS, 'b5', measured, 'Batch BT-TEST.', 1);
    expect(r.binCode).toBe('B5');
    const wt = r.content.binRecipes![1].phosphors.map((p) => p.wtPct!);
    const after = mix(bench, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    expect(colourDistance(after.x + BIAS.x, after.y + BIAS.y, target).steps).toBeLessThan(0.5);
    // The stored prediction of the bin is the model's point of its new recipe (no bias), like every bin of a matrix.
    expect(r.content.binRecipes![1].predicted!.x).toBeCloseTo(after.x, 4);
    expect(r.content.binRecipes![0]).toEqual(content.binRecipes![0]);
    expect(r.content.phosphors).toEqual(content.phosphors);
    expect(r.content.pumpLeakFraction).toBe(content.pumpLeakFraction);
    expect(r.content.notes).toContain('Chip bin B5');
  });

  it('differs from a correction of the nominal recipe on the nominal pump', () => {
    // The point of starting from the bin: the same measured mean asks for a different recipe on a shifted pump.
    const content = matrixContent();
    const measured = { x: target.x + BIAS.x, y: target.y + BIAS.y };
    const b3 = correctBinFromBatch(content, COMPONENTS, 'B3', measured, '', 1).content.binRecipes![0].phosphors.map((p) => p.wtPct);
    const b5 = correctBinFromBatch(content, COMPONENTS, 'B5', measured, '', 1).content.binRecipes![1].phosphors.map((p) => p.wtPct);
    expect(b3).not.toEqual(b5);
  });

  it('refuses a bin the matrix does not hold, naming the bins it has', () => {
    expect(() => correctBinFromBatch(matrixContent(), COMPONENTS, 'B9', { x: 0.43, y: 0.4 }, '', 1)).toThrow(
      /no bin B9 \(it holds B3, B5\)/
    );
  });
});
