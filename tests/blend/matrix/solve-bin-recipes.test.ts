/**
 * The recipe matrix against the checks of the production-spread issue: each bin's centre within
 * 0.5 step of the target (MacAdam-type steps with the IEC 60081 ellipses of the aim), a +2.5 nm pump
 * shift moving the nominal recipe's point as the loading model's own derivative predicts (sign and
 * size), and a bin centred on the nominal pump giving back the nominal recipe. Bins 2.5 nm wide are
 * common practice for blue chips; the demo materials are invented.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_PHOSPHORS, DEMO_PUMPS } from '../../../src/lib/blend/demo-components';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { correctRecipe, type Recipe } from '../../../src/lib/blend/correction';
import { mix } from '../../../src/lib/blend/mix';
import { shiftPump } from '../../../src/lib/blend/shiftPump';
import { solveBinRecipes } from '../../../src/lib/blend/matrix/solveBinRecipes';
import { resolveTarget } from '../../../src/lib/aim';

const pick = (code: string) => DEMO_PHOSPHORS.find((p) => p.name.startsWith(code))!;
const components = { pump: DEMO_PUMPS[0], phosphors: [pick('GL-530'), pick('YL-568'), pick('RD-625')] };
const target = resolveTarget({ kind: 'cctDuv', cct: 3000, duv: 0 });
const loading = { pathLengthMm: 0.3 };
// The nominal recipe: wt % that put the 450 nm pump on 3000 K, Duv 0.
const guess: Recipe = { kind: 'loading', concentrationsWtPct: [6, 6, 2], loading };
const seed = mix(components, guess).evaluation;
const nominal = correctRecipe(prepareBasis(components), guess, [{ x: seed.x, y: seed.y }], target, {
  maxIterations: 80,
  maxTrimFactor: 10
}).recipe;

const bins = [
  { code: 'B3', fromNm: 445, toNm: 447.5 },
  { code: 'B4', fromNm: 447.5, toNm: 450 },
  { code: 'B5', fromNm: 450, toNm: 452.5 },
  { code: 'B6', fromNm: 452.5, toNm: 455 }
];

describe('recipe matrix', () => {
  const matrix = solveBinRecipes(components, nominal, target, bins, 'peak');

  it("puts every bin's centre within 0.5 step of the target, with the same phosphors", () => {
    for (const r of matrix) {
      expect(r.refusal, r.code).toBeNull();
      expect(r.predicted.steps, r.code).toBeLessThan(0.5);
      expect(r.wtPct).toHaveLength(3);
    }
    // Uncorrected, the outer bins miss the target by more than the corrected ones.
    expect(matrix[0].uncorrected.steps).toBeGreaterThan(matrix[0].predicted.steps);
    expect(matrix.map((r) => r.shiftNm)).toEqual([-3.75, -1.25, 1.25, 3.75]);
  });

  it('moves the nominal point for a +2.5 nm pump as the loading model derivative predicts', () => {
    const at = (shift: number) => mix({ ...components, pump: shiftPump(components.pump, shift) }, nominal).evaluation;
    const h = 0.25;
    const plus = at(h);
    const minus = at(-h);
    const dx = ((plus.x - minus.x) / (2 * h)) * 2.5;
    const dy = ((plus.y - minus.y) / (2 * h)) * 2.5;
    const base = at(0);
    const moved = at(2.5);
    expect(Math.sign(moved.x - base.x)).toBe(Math.sign(dx));
    expect(Math.sign(moved.y - base.y)).toBe(Math.sign(dy));
    expect(Math.hypot(moved.x - base.x - dx, moved.y - base.y - dy)).toBeLessThan(0.15 * Math.hypot(dx, dy));
    expect(Math.hypot(dx, dy)).toBeGreaterThan(1e-4);
  });

  it('gives back the nominal recipe for a bin centred on the nominal pump', () => {
    const [same] = solveBinRecipes(components, nominal, target, [{ code: 'N', fromNm: 448.75, toNm: 451.25 }], 'peak');
    expect(same.shiftNm).toBe(0);
    const wt = (nominal as Extract<Recipe, { kind: 'loading' }>).concentrationsWtPct;
    same.wtPct!.forEach((w, i) => expect(w).toBeCloseTo(wt[i], 4));
  });

  it('moves a pump stated on its dominant wavelength so that its dominant wavelength sits at the bin centre', () => {
    const [dom] = solveBinRecipes(components, nominal, target, [{ code: 'D', fromNm: 455, toNm: 457.5 }], 'dominant');
    expect(dom.refusal).toBeNull();
    expect(dom.predicted.steps).toBeLessThan(0.5);
    expect(dom.shiftNm).toBeGreaterThan(0);
  });
});
