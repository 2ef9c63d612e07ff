/**
 * The recipe matrix: for each pump wavelength bin, the recipe with the same phosphors that puts the
 * bin's centre pump on the revision's target. A longer-wavelength blue is absorbed differently and
 * leaks a different blue, so the nominal recipe drifts off target bin by bin; each bin's recipe is
 * found by Gauss–Newton on the phosphor amounts (`correctRecipe`: minimum-norm step, Penrose 1955)
 * from the nominal recipe, on the loading model when the recipe is in wt %, else on the optical model.
 * For a revision aimed at an operating condition each bin is solved on its components at that
 * condition (pump drift and quenching, ../thermal/hotComponents.ts), and the recipe is handed back as
 * the bench weighs it (wt % unchanged; optical fractions de-quenched); `predicted` is then the hot point.
 */
import { prepareBasis } from '../basis';
import { correctRecipe, type Recipe } from '../correction';
import { mix } from '../mix';
import type { BlendComponents } from '../types';
import { colourDistance, type ColourCentre } from '../../aim/distance';
import { binPump, type WavelengthBasis } from './binPump';
import { isBenchCondition, type OperatingCondition } from '../../aim/condition';
import { requireHotComponents, type ThermalById } from '../thermal/hotComponents';
import { dequenchedFractions, quenchedFractions } from '../thermal/fractions';

export interface BinInput {
  code: string;
  fromNm: number;
  toNm: number;
}

export interface BinRecipeResult {
  code: string;
  /** How far the pump was moved for the bin centre, nm. */
  shiftNm: number;
  /** Radiant-power fractions of the output, pump leak first. */
  opticalFractions: number[];
  /** wt % of slurry per phosphor (loading recipes), else null. */
  wtPct: number[] | null;
  predicted: { x: number; y: number; cct: number; duv: number; ra: number | null; r9: number | null; steps: number };
  /** The nominal recipe with this bin's pump: where the bin would land uncorrected. */
  uncorrected: { x: number; y: number; steps: number };
  /** Why this bin's recipe must not be used (no convergence, a phosphor driven to zero, over-loading); null when it may. */
  refusal: string | null;
}

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

export function solveBinRecipes(
  components: BlendComponents,
  nominal: Recipe,
  target: ColourCentre,
  bins: readonly BinInput[],
  basis: WavelengthBasis,
  at: { thermal: ThermalById; condition: OperatingCondition } | null = null
): BinRecipeResult[] {
  return bins.map((bin) => {
    const moved = binPump(components.pump, (bin.fromNm + bin.toNm) / 2, basis);
    const benchComponents = { ...components, pump: moved.pump };
    const hot = at && !isBenchCondition(at.condition) ? requireHotComponents(benchComponents, at.thermal, at.condition) : null;
    const binComponents = hot ? hot.components : benchComponents;
    const toHot = (r: Recipe): Recipe =>
      hot && r.kind === 'optical' ? { kind: 'optical', fractions: quenchedFractions(r.fractions, hot.quench) } : r;
    const start = toHot(nominal);
    const before = mix(binComponents, start).evaluation;
    // The model's own point as the "measurement": no bias, a full (undamped in total) step to target.
    const corrected = correctRecipe(prepareBasis(binComponents), start, [{ x: before.x, y: before.y }], target, {
      stepFraction: 1,
      maxIterations: 60,
      maxTrimFactor: 10
    });
    const after = mix(binComponents, corrected.recipe);
    const e = after.evaluation;
    const handedOver = hot ? dequenchedFractions(after.opticalFractions, hot.quench) : after.opticalFractions;
    return {
      code: bin.code,
      shiftNm: moved.shiftNm,
      opticalFractions: handedOver,
      wtPct: corrected.recipe.kind === 'loading' ? corrected.recipe.concentrationsWtPct : null,
      predicted: {
        x: e.x,
        y: e.y,
        cct: e.cct,
        duv: e.duv,
        ra: e.cri.valid ? finiteOrNull(e.cri.ra) : null,
        r9: e.cri.valid ? finiteOrNull(e.cri.ri[8]) : null,
        steps: colourDistance(e.x, e.y, target).steps
      },
      uncorrected: { x: before.x, y: before.y, steps: colourDistance(before.x, before.y, target).steps },
      refusal: corrected.refusal ? corrected.refusal.message : null
    };
  });
}
