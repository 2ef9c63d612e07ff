/**
 * Blend correction from a measured batch: the revision's recipe, the batch's measured mean and
 * the revision's target go to the blend solver's correction method (`correctBatch`: bias =
 * measured − model, damped Gauss–Newton step on log-amounts; see blend/correction.ts), and the
 * corrected ratios are written into a copy of the revision content for a new draft.
 * Recipe: the loading model (wt % of slurry, Beer–Lambert) when the revision carries it and every
 * phosphor has an absorption coefficient; otherwise the optical fractions (pump leak first).
 * With the optical recipe the new wt % are unknown and left empty for the formulator.
 * A correction that cannot be made (not converged, a component at or below zero) is refused by
 * `correctBatch` (CorrectionRefusedError); a capped trim says so in the draft's note, with the
 * colour point (x,y, CCT, Duv, steps from target) to expect.
 */
import { correctBatch, type CorrectionResponse } from '../blend/correctBatch';
import type { Recipe } from '../blend/correction';
import { mix } from '../blend/mix';
import type { CorrectionRequest } from '../blend/schemas';
import type { BlendComponents } from '../blend/types';
import { fractionsWithLeak, loadingOf, type RevisionContent } from '../recipe';
import { dequenchedFractions, quenchedFractions } from '../blend/thermal/fractions';
import type { ColdCheckPoint } from '../blend/solver/solveAtCondition';
import { BENCH_CONDITION, describeCondition } from '../aim/condition';
import { colourDistance } from '../aim/distance';
import { resolveTarget } from '../aim/target';
import { uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';

/** Default share of the full correction applied in one trim (0.5–0.8 is usual on lines) [common practice]. */
export const DEFAULT_STEP_FRACTION = 0.8;

export function revisionRecipe(content: RevisionContent, components: BlendComponents): Recipe {
  const wt = loadingOf(content);
  const loadingReady = wt !== null && components.phosphors.every((p) => p.absorptionPerWtPctMm !== undefined);
  if (loadingReady && content.loading) {
    const { basis: _basis, ...loading } = content.loading;
    return { kind: 'loading', concentrationsWtPct: wt, loading };
  }
  return { kind: 'optical', fractions: fractionsWithLeak(content) };
}

export function correctionRequest(
  content: RevisionContent,
  components: BlendComponents,
  measuredMean: { x: number; y: number },
  stepFraction = DEFAULT_STEP_FRACTION
): CorrectionRequest {
  return {
    components,
    recipe: revisionRecipe(content, components),
    measured: { kind: 'xy', points: [measuredMean] },
    target: content.target,
    stepFraction
  };
}

export interface BatchCorrection {
  response: CorrectionResponse;
  content: RevisionContent;
}

const round = (v: number, digits: number): number => Number(v.toFixed(digits));

/** Corrected ratios written into a copy of the revision content (with a note saying where they came from). */
export function correctedContent(
  content: RevisionContent,
  components: BlendComponents,
  res: CorrectionResponse,
  note: string
): RevisionContent {
  const recipe = res.recipe;
  const fractions = recipe.kind === 'optical' ? recipe.fractions : mix(components, recipe).opticalFractions;
  const wt = recipe.kind === 'loading' ? recipe.concentrationsWtPct : null;
  return {
    ...content,
    pumpLeakFraction: round(fractions[0], 6),
    phosphors: content.phosphors.map((p, i) => ({ ...p, opticalFraction: round(fractions[i + 1], 6), wtPct: wt ? round(wt[i], 4) : null })),
    notes: [content.notes, note]
      .filter((s) => s.trim())
      .join('\n\n')
      .slice(0, 5000)
  };
}

const pct = (share: number) => `${Math.round(share * 100)} %`;
const signed = (v: number, digits: number) => `${v < 0 ? '−' : '+'}${Math.abs(v).toFixed(digits)}`;

/** The trim in words: how much of the full correction is applied, what capped it, and the colour to expect. */
export function trimNote(res: CorrectionResponse): string {
  const { cap, predicted: p } = res;
  const expect =
    `expect x ${p.x.toFixed(4)}, y ${p.y.toFixed(4)} (${Math.round(p.cct)} K, Duv ${signed(p.duv, 4)}), ` +
    `${res.errorAfter.steps.toFixed(1)} steps from target.`;
  if (cap.limitedBy === 'none') return `Full correction applied; ${expect}`;
  const why =
    cap.limitedBy === 'stepFraction'
      ? `the step share asked for`
      : `${pct(cap.requestedShare)} was asked for, and no phosphor may change by more than ×${cap.maxTrimFactor} in one trim`;
  return `Trim capped at ${pct(cap.appliedShare)} of the full correction (by ${pct(1 - cap.appliedShare)}: ${why}); ${expect}`;
}

export function correctFromBatch(
  content: RevisionContent,
  components: BlendComponents,
  measuredMean: { x: number; y: number },
  note: string,
  stepFraction = DEFAULT_STEP_FRACTION
): BatchCorrection {
  const response = correctBatch(correctionRequest(content, components, measuredMean, stepFraction));
  return { response, content: correctedContent(content, components, response, `${note} ${trimNote(response)}`) };
}

export interface ConditionCorrection extends BatchCorrection {
  /** The bench point the corrected recipe should measure (model plus the observed bias): the new cold check. */
  coldCheck: ColdCheckPoint;
}

/**
 * Correction of a revision aimed at an operating condition from parts measured at the bench: the
 * bias seen cold (measured − predicted bench point) is carried to the hot point, the correction is
 * solved on the components at the condition so that the hot prediction plus the bias lands on the
 * target, and the corrected recipe is handed back as the bench weighs it (loading model: the same
 * wt %; optical fractions: de-quenched). Same correction method as at the bench (`correctBatch`).
 * `measuredAt` says whether the mean was measured at the bench or at the revision's condition.
 */
export function correctFromBatchAtCondition(
  content: RevisionContent,
  components: BlendComponents,
  hot: { components: BlendComponents; quench: number[] },
  measuredMean: { x: number; y: number },
  measuredAt: 'bench' | 'condition',
  note: string,
  stepFraction = DEFAULT_STEP_FRACTION
): ConditionCorrection {
  const bench = revisionRecipe(content, components);
  const toHot = (r: Recipe): Recipe =>
    r.kind === 'optical' ? { kind: 'optical', fractions: quenchedFractions(r.fractions, hot.quench) } : r;
  const toBench = (r: Recipe): Recipe =>
    r.kind === 'optical' ? { kind: 'optical', fractions: dequenchedFractions(r.fractions, hot.quench) } : r;
  const coldModel = mix(components, bench).evaluation;
  const hotModel = mix(hot.components, toHot(bench)).evaluation;
  // The bias is taken as the same cold and hot: the measured point is moved by the model's cold-to-hot shift.
  const measuredHot =
    measuredAt === 'bench' ? { x: measuredMean.x + hotModel.x - coldModel.x, y: measuredMean.y + hotModel.y - coldModel.y } : measuredMean;
  const response = correctBatch({
    components: hot.components,
    recipe: toHot(bench),
    measured: { kind: 'xy', points: [measuredHot] },
    target: content.target,
    stepFraction
  });
  const benchResponse = { ...response, recipe: toBench(response.recipe) };
  const bias = { x: measuredHot.x - hotModel.x, y: measuredHot.y - hotModel.y };
  const e = mix(components, benchResponse.recipe).evaluation;
  const x = e.x + bias.x;
  const y = e.y + bias.y;
  const { cct, duv } = uvToCct(...xyToUv(x, y));
  const coldCheck: ColdCheckPoint = {
    x,
    y,
    cct,
    duv,
    ra: e.cri.ra,
    r9: e.cri.ri[8],
    steps: colourDistance(x, y, resolveTarget(content.target)).steps,
    condition: BENCH_CONDITION
  };
  const corrected = correctedContent(
    content,
    components,
    benchResponse,
    `${note} ${trimNote(response)} (at ${describeCondition(content.condition)})`
  );
  return { response, content: { ...corrected, coldCheck }, coldCheck };
}
