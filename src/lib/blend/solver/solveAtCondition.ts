/**
 * Solving for the colour at an operating condition: the solver runs on the components as they are
 * at the condition (`hotComponents`: pump drifted, phosphors quenched), so the recipe it hands over
 * makes the hot spectrum meet the target and floors; each candidate then carries the cold check —
 * the point a bench build (25 °C) of the same recipe measures. With the loading model the recipe
 * is the wt % (the same powder hot and cold); with optical fractions only, the cold fractions are
 * the hot ones with each phosphor's quench undone (superposition, Ohno, Opt. Eng. 44 (2005) 111302),
 * the pump leak unchanged. The bench condition solves exactly as `solveBlend`.
 */
import { type OperatingCondition, BENCH_CONDITION, isBenchCondition } from '../../aim/condition';
import { colourDistance } from '../../aim/distance';
import { resolveTarget } from '../../aim/target';
import { mix, type MixRatios } from '../mix';
import { dequenchedFractions } from '../thermal/fractions';
import { type HotShift, type ThermalById, requireHotComponents } from '../thermal/hotComponents';
import type { SolveCandidate } from './buildCandidate';
import { type SolveProblem, type SolveResult, solveBlend } from './solveBlend';

export interface ColdCheckPoint {
  x: number;
  y: number;
  cct: number;
  duv: number;
  ra: number;
  r9: number;
  /** Distance from the (hot) target, MacAdam-type steps: how far the bench point sits from the aim. */
  steps: number;
  condition: OperatingCondition;
}

export type ConditionCandidate = SolveCandidate & { coldCheck: ColdCheckPoint | null };

export interface ConditionSolveResult extends Omit<SolveResult, 'candidates'> {
  /** null = bench. */
  condition: OperatingCondition | null;
  /** Pump drift, quench factors … applied (null at the bench). */
  shift: Omit<HotShift, 'condition'> | null;
  candidates: ConditionCandidate[];
}

export interface ConditionSolveProblem extends SolveProblem {
  condition: OperatingCondition | null;
  thermal: ThermalById;
}

/** The recipe a candidate hands over, as the bench build will weigh it. */
export function benchRecipeOf(c: SolveCandidate, quench: number[], loading: SolveProblem['loading']): MixRatios {
  if (loading && c.concentrationsWtPct) return { kind: 'loading', concentrationsWtPct: c.concentrationsWtPct, loading };
  return { kind: 'optical', fractions: dequenchedFractions(c.opticalFractions, quench) };
}

function coldPointOf(problem: ConditionSolveProblem, quench: number[], c: SolveCandidate): ColdCheckPoint {
  const e = mix(problem.components, benchRecipeOf(c, quench, problem.loading)).evaluation;
  const steps = colourDistance(e.x, e.y, resolveTarget(problem.target)).steps;
  return { x: e.x, y: e.y, cct: e.cct, duv: e.duv, ra: e.cri.ra, r9: e.cri.ri[8], steps, condition: BENCH_CONDITION };
}

export function solveAtCondition(problem: ConditionSolveProblem): ConditionSolveResult {
  if (!problem.condition || isBenchCondition(problem.condition)) {
    const r = solveBlend(problem);
    return { ...r, condition: null, shift: null, candidates: r.candidates.map((c) => ({ ...c, coldCheck: null })) };
  }
  const hot = requireHotComponents(problem.components, problem.thermal, problem.condition);
  const r = solveBlend({ ...problem, components: hot.components });
  const shift = {
    pumpShiftNm: hot.pumpShiftNm,
    pumpOutputFactor: hot.pumpOutputFactor,
    quench: hot.quench,
    peakShiftNm: hot.peakShiftNm,
    widthFactor: hot.widthFactor
  };
  return {
    ...r,
    condition: problem.condition,
    shift,
    candidates: r.candidates.map((c) => ({ ...c, coldCheck: coldPointOf(problem, hot.quench, c) }))
  };
}
