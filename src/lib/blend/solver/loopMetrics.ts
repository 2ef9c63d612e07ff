/**
 * Metrics of a candidate mix inside the search loop: CIE 13.3 CRI always (cheap), TM-30
 * only when a floor or the objective needs it, LER always, cost only for 'minCost'.
 * All colour metrics come from the core's `evaluateGrid` (the same code that reports the
 * finalists), so a floor met in the loop is met in the report.
 */
import { evaluateGrid } from '../../spectral/evaluate';
import type { PartialSpectrumEvaluation } from '../../spectral/types';
import type { Basis } from '../basis';
import { superposeSpd } from '../superposition';
import type { LoadingParams } from '../types';
import { type Floors, type LoopMetrics, type Objective, needsTm30, violation } from '../../aim/floors';
import { phosphorCostPer1000Lm } from './phosphorCost';

export interface LoopPoint {
  fractions: number[];
  metrics: LoopMetrics;
  criValid: boolean;
}

export type LoopEvaluator = (fractions: number[]) => LoopPoint;

export function loopMetricsOf(ev: PartialSpectrumEvaluation, cost: number | null): { metrics: LoopMetrics; criValid: boolean } {
  return {
    metrics: {
      ra: ev.cri?.ra ?? NaN,
      r9: ev.cri?.ri[8] ?? NaN,
      ler: ev.ler,
      melDer: ev.alphaOpic.der.melanopic,
      rf: ev.tm30?.rf ?? null,
      rg: ev.tm30?.rg ?? null,
      rfh1: ev.tm30?.bins[0]?.rf ?? null,
      rcsh1: ev.tm30?.bins[0]?.rcs ?? null,
      costPer1000Lm: cost
    },
    criValid: ev.cri?.valid ?? false
  };
}

export function makeLoopEvaluator(
  basis: Basis,
  floors: Floors,
  objective: Objective,
  loading: LoadingParams | undefined
): { evaluate: LoopEvaluator; count: () => number } {
  const tm30 = needsTm30(floors, objective);
  let n = 0;
  const evaluate: LoopEvaluator = (fractions) => {
    n++;
    const spd = superposeSpd(basis, fractions);
    const ev = evaluateGrid(spd, { cri: true, tm30 });
    const point = { fractions, ...loopMetricsOf(ev, null) };
    // Cost (a loading-model inverse when loading parameters are given) only where it can
    // matter: the merit of a mix that misses a floor ignores the objective.
    if (objective === 'minCost' && violation(floors, point.metrics) === 0) {
      point.metrics.costPer1000Lm = phosphorCostPer1000Lm(basis, fractions, ev.ler, loading);
    }
    return point;
  };
  return { evaluate, count: () => n };
}
