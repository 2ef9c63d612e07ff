/**
 * Turns a chosen mix into a reported candidate: full evaluation by the core (CRI and
 * TM-30), chromaticity error against the target, floors met/violated/binding, unused
 * components, cost, and wt % from the loading model when its parameters are given.
 */
import { isInQuadrangle } from '../../spectral/ansi/c78377';
import { evaluateGrid } from '../../spectral/evaluate';
import type { SpectrumEvaluation } from '../../spectral/types';
import type { Basis } from '../basis';
import { concentrationsForFractions } from '../loading/concentrationsForFractions';
import { superposeSpd } from '../superposition';
import type { LoadingParams } from '../types';
import { type ColourDistance, type Tolerance, colourDistance, withinTolerance } from '../../aim/distance';
import { type Floors, type Objective, bindingFloors, violatedFloors } from '../../aim/floors';
import { loopMetricsOf } from './loopMetrics';
import { type CostBasis, costBasisFor, phosphorCostPer1000Lm } from './phosphorCost';
import type { ResolvedTarget } from '../../aim/target';

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
}

export interface CandidateContext {
  basis: Basis;
  target: ResolvedTarget;
  tolerance: Tolerance;
  floors: Floors;
  objective: Objective;
  loading?: LoadingParams;
}

export function buildCandidate(ctx: CandidateContext, fractions: number[]): SolveCandidate {
  const { basis, target, loading } = ctx;
  const evaluation = evaluateGrid(superposeSpd(basis, fractions));
  const cost = phosphorCostPer1000Lm(basis, fractions, evaluation.ler, loading);
  const { metrics, criValid } = loopMetricsOf(evaluation, cost);
  const error = colourDistance(evaluation.x, evaluation.y, target);
  let concentrations: number[] | null = null;
  const notes: string[] = [];
  if (loading && basis.loading) {
    const sol = concentrationsForFractions(basis.loading, fractions, loading);
    concentrations = sol.concentrationsWtPct;
    if (!sol.converged) notes.push(`loading model reproduces the mix only to ${sol.maxFractionError.toExponential(1)} in fraction`);
    if (loading.cascade) notes.push('wt % include first-order re-absorption; the spectrum shown is the optical superposition');
  }
  if (!criValid) notes.push('DC ≥ 5.4e-3: Ra is not meaningful at this colour point (CIE 13.3 §5.3)');
  const violations = violatedFloors(ctx.floors, metrics);
  const unused = basis.components.filter((_, k) => fractions[k] < UNUSED_FRACTION).map((c) => `unused:${c.id}`);
  return {
    rank: 0,
    feasible: violations.length === 0,
    opticalFractions: fractions,
    components: basis.components.map((c, k) => ({
      id: c.id,
      name: c.name,
      role: c.role,
      opticalFraction: fractions[k],
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
    notes
  };
}
