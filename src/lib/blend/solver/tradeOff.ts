/**
 * Trade-off front: the best LER a blend can reach at the target colour point for each level of one
 * chosen rendition metric (Ra, R9 or Rf), with the other floors held — what a point of that metric
 * costs in efficacy. Method: the ε-constraint method (Haimes, Lasdon & Wismer, IEEE Trans. Syst.
 * Man Cybern. 1 (1971) 296): for each level ε of the metric, maximise LER subject to metric ≥ ε on
 * the equal-chromaticity polytope (the solver's own search, `searchPolytope`); every mix evaluated on
 * the way is kept, and the front is the set of feasible mixes no other evaluated mix beats on both
 * axes (Pareto, 1906). Colour constraint and metrics as in `solveBlend` (Ohno, Opt. Eng. 44 (2005)
 * 111302; CIE 13.3-1995; ANSI/IES TM-30-20).
 */
import { BlendInputError } from '../errors';
import { prepareBasis } from '../basis';
import type { BlendComponents, LoadingParams } from '../types';
import { resolveTarget, type Target } from '../../aim/target';
import { violation, type Floors, type LoopMetrics } from '../../aim/floors';
import { xyToUvPrime, xyzToUvPrime } from '../../spectral/colorimetry/chromaticity';
import { convexHull, nearestInHull, type Point } from './convexHull';
import { colourPlane } from './colourPlane';
import { makeLoopEvaluator, type LoopPoint } from './loopMetrics';
import { searchPolytope } from './searchPolytope';
import { buildCandidate, type CandidateContext, type SolveCandidate } from './buildCandidate';

import { TRADE_OFF_METRICS, TRADE_OFF_LABEL, type TradeOffMetric } from './tradeOffMetric';

export { TRADE_OFF_METRICS, TRADE_OFF_LABEL, type TradeOffMetric };

/** The value read, whether more is better (+1) or less (−1), and the floor that holds a level of it. */
const AXIS: Record<TradeOffMetric, { value: 'ra' | 'r9' | 'rf' | 'melDer'; sense: 1 | -1; floor: keyof Floors }> = {
  ra: { value: 'ra', sense: 1, floor: 'raMin' },
  r9: { value: 'r9', sense: 1, floor: 'r9Min' },
  rf: { value: 'rf', sense: 1, floor: 'rfMin' },
  melDerHigh: { value: 'melDer', sense: 1, floor: 'melDerMin' },
  melDerLow: { value: 'melDer', sense: -1, floor: 'melDerMax' }
};

export interface TradeOffProblem {
  components: BlendComponents;
  target: Target;
  floors?: Floors;
  metric: TradeOffMetric;
  /** Points wanted on the front (default 20). */
  points?: number;
  loading?: LoadingParams;
}

export interface TradeOffPoint {
  /** Value of the chosen metric. */
  metric: number;
  lerLmPerW: number;
  candidate: SolveCandidate;
}

export interface TradeOffResult {
  status: 'ok' | 'unreachable' | 'noFeasibleMix';
  reason: string | null;
  metric: TradeOffMetric;
  /** From the most efficient point to the best value of the metric: LER falls along it. */
  front: TradeOffPoint[];
  /** Every mix evaluated (metric, LER, whether it met the floors): the cloud behind the front. */
  evaluated: { metric: number; ler: number; feasible: boolean }[];
  evaluations: number;
}

const DEFAULT_POINTS = 20;
const LEVEL_STARTS = 2;

const metricOf = (m: LoopMetrics, metric: TradeOffMetric): number | null => {
  const v = m[AXIS[metric].value];
  return v === null || v === undefined || !Number.isFinite(v) ? null : v;
};
/** The metric signed so that larger is better (the Pareto filter and the levels work on this). */
const scoreOf = (m: LoopMetrics, metric: TradeOffMetric): number | null => {
  const v = metricOf(m, metric);
  return v === null ? null : AXIS[metric].sense * v;
};

/** Indices of the points no other point beats on both axes (larger is better on both). */
export function paretoFront(points: { a: number; b: number }[]): number[] {
  const order = points.map((_, i) => i).sort((i, j) => points[j].a - points[i].a || points[j].b - points[i].b);
  const front: number[] = [];
  let bestB = -Infinity;
  for (const i of order) {
    if (points[i].b > bestB) {
      front.push(i);
      bestB = points[i].b;
    }
  }
  return front;
}

export function traceTradeOff(problem: TradeOffProblem): TradeOffResult {
  const n = problem.components.phosphors.length;
  if (n < 2 || n > 5) throw new BlendInputError(`a trade-off needs 2–5 phosphors (got ${n})`);
  const wanted = Math.max(2, Math.min(50, problem.points ?? DEFAULT_POINTS));
  const floors = problem.floors ?? {};
  const basis = prepareBasis(problem.components);
  const target = resolveTarget(problem.target);
  const hull = convexHull(basis.components.map((c) => xyzToUvPrime(...c.xyz) as Point));
  const near = nearestInHull(hull, xyToUvPrime(target.x, target.y) as Point);
  const none = { metric: problem.metric, front: [], evaluated: [], evaluations: 0 };
  if (near.distance > 1e-6) {
    return { ...none, status: 'unreachable', reason: `${target.label} lies outside the colour gamut of these components.` };
  }
  const plane = colourPlane(
    basis.components.map((c) => c.xyz),
    [target.x, target.y]
  );
  const axis = AXIS[problem.metric];
  // TM-30 is computed in the loop only when a floor or objective names it: an Rf axis floors Rf at 0.
  const loopFloors: Floors = problem.metric === 'rf' ? { rfMin: 0, ...floors } : floors;
  const loop = makeLoopEvaluator(basis, loopFloors, 'maxLer', problem.loading);
  const seen: LoopPoint[] = [];
  const evaluate = (w: number[]) => {
    const p = loop.evaluate(w);
    seen.push(p);
    return p;
  };
  // Ends of the range: the LER optimum under the floors, and the best value of the metric seen.
  searchPolytope(plane, evaluate, { floors: loopFloors, objective: 'maxLer', starts: LEVEL_STARTS });
  const feasibleValues = () =>
    seen.filter((p) => violation(floors, p.metrics) === 0 && p.criValid).map((p) => scoreOf(p.metrics, problem.metric));
  const values = feasibleValues().filter((v): v is number => v !== null);
  if (values.length === 0) {
    return {
      ...none,
      status: 'noFeasibleMix',
      reason: `No mix of these components at ${target.label} meets the floors, so there is no trade-off to trace.`,
      evaluations: loop.count()
    };
  }
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  if (plane.dimension > 0 && hi > lo) {
    for (let k = 1; k < wanted; k++) {
      const level = lo + ((hi - lo) * k) / wanted;
      searchPolytope(plane, evaluate, {
        floors: { ...loopFloors, [axis.floor]: axis.sense * level },
        objective: 'maxLer',
        starts: LEVEL_STARTS
      });
    }
  }
  const feasible = seen.filter((p) => p.criValid && violation(floors, p.metrics) === 0 && metricOf(p.metrics, problem.metric) !== null);
  const axes = feasible.map((p) => ({ a: scoreOf(p.metrics, problem.metric)!, b: p.metrics.ler }));
  const frontIdx = paretoFront(axes).sort((i, j) => axes[i].a - axes[j].a);
  // Evenly spread along the metric: the front point nearest each of `wanted` levels, each once.
  const chosen: number[] = [];
  const span = axes[frontIdx.at(-1)!].a - axes[frontIdx[0]].a;
  for (let k = 0; k < wanted && chosen.length < frontIdx.length; k++) {
    const level = axes[frontIdx[0]].a + (span * k) / Math.max(1, wanted - 1);
    const best = frontIdx
      .filter((i) => !chosen.includes(i))
      .reduce((a, b) => (Math.abs(axes[b].a - level) < Math.abs(axes[a].a - level) ? b : a));
    chosen.push(best);
  }
  chosen.sort((i, j) => axes[i].a - axes[j].a);
  const ctx: CandidateContext = {
    basis,
    target,
    tolerance: { kind: 'sdcm', steps: 3 },
    floors,
    objective: 'maxLer',
    loading: problem.loading,
    solvedAt: [target.x, target.y]
  };
  const front = chosen.map((i, rank) => ({
    metric: axis.sense * axes[i].a,
    lerLmPerW: axes[i].b,
    candidate: { ...buildCandidate(ctx, feasible[i].fractions), rank: rank + 1 }
  }));
  return {
    status: 'ok',
    reason: null,
    metric: problem.metric,
    front,
    evaluated: seen
      .filter((p) => metricOf(p.metrics, problem.metric) !== null && p.criValid)
      .map((p) => ({ metric: metricOf(p.metrics, problem.metric)!, ler: p.metrics.ler, feasible: violation(floors, p.metrics) === 0 })),
    evaluations: loop.count()
  };
}
