/**
 * Turns a chosen mix into a reported candidate: full evaluation by the core (CRI and
 * TM-30), chromaticity error against the target, floors met/violated/binding, unused
 * components, cost, and wt % from the loading model when its parameters are given.
 * With re-absorption on, the mix is realised on the loading model (`realiseOnLoadingModel`)
 * and everything reported (colour, Ra, R9, TM-30, LER, cost, fractions) is computed from the
 * loading-model spectrum of the wt % handed over. A mix that cannot be weighed carries no
 * wt %, is not feasible, and says why.
 */
import { isInQuadrangle } from '../../spectral/ansi/c78377';
import { evaluateGrid } from '../../spectral/evaluate';
import type { SpectrumEvaluation } from '../../spectral/types';
import type { Basis } from '../basis';
import { concentrationsForFractions } from '../loading/concentrationsForFractions';
import { superposeSpd } from '../superposition';
import { spectrumModelOf, type SpectrumModel } from './spectrumModel';
import { realiseOnLoadingModel } from './realiseOnLoadingModel';
import type { LoadingParams } from '../types';
import { type ColourDistance, type Tolerance, colourDistance, withinTolerance } from '../../aim/distance';
import { type Floors, type Objective, bindingFloors, violatedFloors } from '../../aim/floors';
import { loopMetricsOf } from './loopMetrics';
import { type CostBasis, costBasisFor, loadingCostPer1000Lm, phosphorCostPer1000Lm } from './phosphorCost';
import type { ResolvedTarget } from '../../aim/target';

/** Start of the violation that says why a mix has no recipe in wt %. */
export const NO_RECIPE = 'no recipe in wt %: ';

/** A component whose optical fraction is below this is reported as unused. */
export const UNUSED_FRACTION = 1e-4;

export interface CandidateComponent {
  id: string;
  name: string;
  role: 'pump' | 'phosphor';
  opticalFraction: number;
  concentrationWtPct: number | null;
}

export interface SolveCandidate {
  rank: number;
  feasible: boolean;
  /** Radiant-power fractions, pump leak first, Σ = 1. */
  opticalFractions: number[];
  components: CandidateComponent[];
  /** wt % of each phosphor in the slurry (loading model), or null. */
  concentrationsWtPct: number[] | null;
  evaluation: SpectrumEvaluation;
  chromaticityError: ColourDistance;
  withinTolerance: boolean;
  /** Inside the target's ANSI quadrangle (null when the target is not a bin). */
  inAnsiBin: boolean | null;
  costPer1000Lm: number | null;
  costBasis: CostBasis;
  /** Floors within 0.5 of their limit, and `unused:<id>` for components at w = 0. */
  binding: string[];
  violations: string[];
  notes: string[];
  /** Which model produced the spectrum and metrics shown. */
  model: SpectrumModel;
}

export interface CandidateContext {
  basis: Basis;
  target: ResolvedTarget;
  tolerance: Tolerance;
  floors: Floors;
  objective: Objective;
  loading?: LoadingParams;
  /** Colour point the mix is solved at (default: the target). */
  solvedAt?: [number, number];
  /** The fractions are outputs of the loading model with re-absorption (not of the superposition). */
  fractionsOnLoadingModel?: boolean;
}

export function buildCandidate(ctx: CandidateContext, fractions: number[]): SolveCandidate {
  const { basis, target, loading } = ctx;
  const model = spectrumModelOf(basis, loading);
  const notes: string[] = [];
  let refusal: string | null = null;
  let concentrations: number[] | null = null;
  let shown = fractions;
  let evaluation;
  let cost: number | null;
  if (model.kind === 'loadingWithReabsorption' && loading) {
    const real = realiseOnLoadingModel(basis, loading, fractions, ctx.solvedAt ?? [target.x, target.y], ctx.fractionsOnLoadingModel);
    if (real.ok) {
      concentrations = real.concentrationsWtPct;
      shown = real.result.opticalFractions;
      evaluation = evaluateGrid(real.result.spd);
      cost = loadingCostPer1000Lm(basis, concentrations, real.result.radiantEfficiency, evaluation.ler, loading);
    } else {
      refusal = real.reason;
      evaluation = evaluateGrid(superposeSpd(basis, fractions));
      cost = null;
    }
  } else {
    evaluation = evaluateGrid(superposeSpd(basis, fractions));
    cost = phosphorCostPer1000Lm(basis, fractions, evaluation.ler, loading);
    if (loading && basis.loading) {
      const sol = concentrationsForFractions(basis.loading, fractions, loading);
      if (sol.converged) concentrations = sol.concentrationsWtPct;
      else refusal = sol.refusal;
    }
  }
  const { metrics, criValid } = loopMetricsOf(evaluation, cost);
  const error = colourDistance(evaluation.x, evaluation.y, target);
  if (!criValid) notes.push('DC ≥ 5.4e-3: Ra is not meaningful at this colour point (CIE 13.3 §5.3)');
  const violations = violatedFloors(ctx.floors, metrics);
  if (refusal) violations.push(`${NO_RECIPE}${refusal}`);
  const unused = basis.components.filter((_, k) => shown[k] < UNUSED_FRACTION).map((c) => `unused:${c.id}`);
  return {
    rank: 0,
    feasible: violations.length === 0,
    opticalFractions: shown,
    components: basis.components.map((c, k) => ({
      id: c.id,
      name: c.name,
      role: c.role,
      opticalFraction: shown[k],
      concentrationWtPct: concentrations && k > 0 ? concentrations[k - 1] : null
    })),
    concentrationsWtPct: concentrations,
    evaluation,
    chromaticityError: error,
    withinTolerance: withinTolerance(error, ctx.tolerance),
    inAnsiBin: target.ansiBin ? isInQuadrangle(evaluation.x, evaluation.y, target.ansiBin) : null,
    costPer1000Lm: cost,
    costBasis: costBasisFor(basis, loading),
    binding: [...bindingFloors(ctx.floors, metrics), ...unused],
    violations,
    notes,
    model
  };
}
