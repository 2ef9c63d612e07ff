/**
 * Measure → correct: new ratios that move the mean colour of built parts back to target.
 *
 * Practice (common practice): Δ = target − measured mean; Jacobian of
 * (x, y) w.r.t. the recipe knobs; step Δp = J⁺Δ, damped and iterated. Here:
 *   knobs    sᵢ = ln of each phosphor's amount (optical: wᵢ relative to the pump leak;
 *            loading: cᵢ in wt %), so steps are relative and amounts stay positive;
 *   bias     b = measured − model(recipe), carried as a constant offset
 *            (the model's error is assumed locally constant);
 *   step     Δs = Jᵀ(JJᵀ + εI)⁻¹ r, r = target − (model(s) + b): the minimum-norm
 *            Gauss–Newton step (Penrose 1955 pseudo-inverse) for n ≥ 2 knobs, J by
 *            forward differences of +1 % (the sensitivities); damping 0.8 per iteration;
 *   result   s_final = share · s*, share = stepFraction (1 = full correction; 0.5–0.8 is
 *            the cautious first trim practised on lines [common practice]), lowered when a
 *            component would change by more than the trim limit (correctionLimits.ts).
 * The predicted colour point includes the bias. Linear algebra: mathjs.
 * A correction that does not converge, or needs a component at or below zero, is flagged with
 * `refusal` (correctionLimits.ts); `correctBatch` turns that into a refusal for the caller.
 */
import { BlendInputError } from './errors';
import { lusolve } from 'mathjs';
import { uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';
import type { Basis } from './basis';
import { type ColourModel, RELATIVE_STEP, loadingColourModel, opticalColourModel } from './sensitivities';
import { colourDistance, type ColourCentre, type ColourDistance } from '../aim/distance';
import { type CorrectionRefusal, type TrimCap, refusalOf, trimCap } from './correctionLimits';
import { normaliseRatios } from './superposition';
import type { LoadingParams } from './types';

export type Recipe = { kind: 'optical'; fractions: number[] } | { kind: 'loading'; concentrationsWtPct: number[]; loading: LoadingParams };

export interface CorrectionResult {
  recipe: Recipe;
  /** Multiplier applied to each phosphor amount (1 = unchanged). */
  multipliers: number[];
  bias: { dx: number; dy: number };
  measuredMean: { x: number; y: number };
  predicted: { x: number; y: number; cct: number; duv: number };
  errorBefore: ColourDistance;
  errorAfter: ColourDistance;
  iterations: number;
  converged: boolean;
  /** How much of the full correction is applied, and what capped it. */
  cap: TrimCap;
  /** Why this correction must not be handed over (not converged, below zero, over-loaded); null when it may. */
  refusal: CorrectionRefusal | null;
}

const DAMPING = 0.8;
const EPS = 1e-14;
const H = Math.log(1 + RELATIVE_STEP);

function knobModel(basis: Basis, recipe: Recipe): { model: ColourModel; apply: (s: number[]) => Recipe; n: number } {
  if (recipe.kind === 'optical') {
    const w = normaliseRatios(recipe.fractions);
    const m = opticalColourModel(basis);
    const full = (s: number[]) => w.map((v, k) => (k === 0 ? v : v * Math.exp(s[k - 1])));
    return { model: (s) => m(full(s)), apply: (s) => ({ kind: 'optical', fractions: normaliseRatios(full(s)) }), n: w.length - 1 };
  }
  const m = loadingColourModel(basis, recipe.loading);
  const full = (s: number[]) => recipe.concentrationsWtPct.map((c, i) => c * Math.exp(s[i]));
  return { model: (s) => m(full(s)), apply: (s) => ({ ...recipe, concentrationsWtPct: full(s) }), n: recipe.concentrationsWtPct.length };
}

export function correctRecipe(
  basis: Basis,
  recipe: Recipe,
  measuredPoints: { x: number; y: number }[],
  target: ColourCentre,
  options: { stepFraction?: number; maxIterations?: number; maxTrimFactor?: number } = {}
): CorrectionResult {
  if (measuredPoints.length === 0) throw new BlendInputError('correction needs at least one measured point');
  const mx = measuredPoints.reduce((s, p) => s + p.x, 0) / measuredPoints.length;
  const my = measuredPoints.reduce((s, p) => s + p.y, 0) / measuredPoints.length;
  const { model, apply, n } = knobModel(basis, recipe);
  const s = new Array<number>(n).fill(0);
  const [px, py] = model(s);
  const bias = { dx: mx - px, dy: my - py };
  let it = 0;
  let converged = false;
  for (; it < (options.maxIterations ?? 40); it++) {
    const [fx, fy] = model(s);
    const r = [target.x - (fx + bias.dx), target.y - (fy + bias.dy)];
    if (Math.hypot(r[0], r[1]) < 1e-7) {
      converged = true;
      break;
    }
    const J = Array.from({ length: n }, (_, i) => {
      const q = s.slice();
      q[i] += H;
      const [x, y] = model(q);
      return [(x - fx) / H, (y - fy) / H];
    });
    const a = [0, 1].map((u) => [0, 1].map((v) => J.reduce((acc, col) => acc + col[u] * col[v], 0) + (u === v ? EPS : 0)));
    const lam = (lusolve(a, r) as number[][]).map((row) => row[0]);
    for (let i = 0; i < n; i++) s[i] += DAMPING * (J[i][0] * lam[0] + J[i][1] * lam[1]);
  }
  const cap = trimCap(s, options.stepFraction ?? 1, options.maxTrimFactor);
  const sFinal = s.map((v) => v * cap.appliedShare);
  const [fx, fy] = model(sFinal);
  const predicted = { x: fx + bias.dx, y: fy + bias.dy };
  const { cct, duv } = uvToCct(...xyToUv(predicted.x, predicted.y));
  const recipeAfter = apply(sFinal);
  const [cx, cy] = model(s);
  const refusal = refusalOf({
    converged,
    iterations: it,
    fullMultipliers: s.map(Math.exp),
    knobNames: basis.components.slice(1).map((c) => c.name),
    closestSteps: colourDistance(cx + bias.dx, cy + bias.dy, target).steps,
    appliedTotalWtPct: recipeAfter.kind === 'loading' ? recipeAfter.concentrationsWtPct.reduce((a, c) => a + c, 0) : null
  });
  return {
    recipe: recipeAfter,
    multipliers: sFinal.map(Math.exp),
    bias,
    measuredMean: { x: mx, y: my },
    predicted: { ...predicted, cct, duv },
    errorBefore: colourDistance(mx, my, target),
    errorAfter: colourDistance(predicted.x, predicted.y, target),
    iterations: it,
    converged,
    cap,
    refusal
  };
}
