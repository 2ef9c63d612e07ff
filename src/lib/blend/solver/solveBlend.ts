/**
 * Blend solver: ratios of pump + 2–5 phosphors that hit a target colour point and
 * maximise an objective subject to colour-rendition floors.
 *
 * Method (Ohno, Opt. Eng. 44 (2005) 111302 for the linear colour
 * constraint): (1) reachability — the target must lie in the convex hull of the component
 * chromaticities (u′v′; `convexHull.ts`); when it does not, the nearest hull point is used
 * if it is within tolerance, else status 'unreachable'. (2) The equal-chromaticity
 * polytope (`colourPlane.ts`): pump + 2 phosphors is an exact solve (a single point).
 * (3) Multi-start Nelder–Mead over the polytope (`searchPolytope.ts`) with CRI (and TM-30
 * only when needed) inside the loop. (4) Finalists get the full core evaluation.
 * Every candidate sits on the target colour point (the process spread, not the recipe,
 * should consume the tolerance) unless the target is out of gamut.
 * With re-absorption on (loading.cascade), finalists are realised on the loading model
 * (`realiseOnLoadingModel`) and ranked again on the spectrum of the wt % they hand over; a
 * solve none of whose finalists can be weighed is refused (`LoadingRefusedError`, 422).
 */
import { BlendInputError } from '../errors';
import { LoadingRefusedError } from '../loading/concentrationsForFractions';
import { loopMetricsOf } from './loopMetrics';
import { refineOnLoadingModel } from './refineOnLoadingModel';
import { type SpectrumModel, spectrumModelOf } from './spectrumModel';
import { uvToCct } from '../../spectral/cct/index';
import { uvPrimeToXy, xyToUv, xyToUvPrime, xyzToUvPrime } from '../../spectral/colorimetry/chromaticity';
import { prepareBasis } from '../basis';
import type { BlendComponents, LoadingParams } from '../types';
import { type CandidateContext, NO_RECIPE, type SolveCandidate, buildCandidate } from './buildCandidate';
import { type Tolerance, colourDistance, withinTolerance } from '../../aim/distance';
import { colourPlane } from './colourPlane';
import { type Point, convexHull, nearestInHull } from './convexHull';
import { type Floors, type Objective, FLOOR_RULES, floorsInside, formatFloorValue } from '../../aim/floors';
import { makeLoopEvaluator, type LoopPoint } from './loopMetrics';
import { type Target, resolveTarget } from '../../aim/target';
import { distance, meritOf, searchPolytope } from './searchPolytope';

export interface SolveProblem {
  components: BlendComponents;
  target: Target;
  /** Default: 3 SDCM. */
  tolerance?: Tolerance;
  floors?: Floors;
  objective: Objective;
  /** Default 3. */
  maxCandidates?: number;
  loading?: LoadingParams;
}

export type SolveStatus = 'ok' | 'unreachable' | 'floorsNotMet';

export interface SolveResult {
  status: SolveStatus;
  reason: string | null;
  target: { x: number; y: number; cct: number; duv: number; label: string };
  /** Colour point the candidates were solved at (the target, or the nearest reachable point). */
  solvedAt: { x: number; y: number; cct: number; duv: number };
  candidates: SolveCandidate[];
  /** Which model produced the candidates' spectra and metrics. */
  model: SpectrumModel;
  /** Best value of each floored metric over every evaluated mix (each taken alone). */
  bestAchievable: Partial<Record<keyof Floors, number>>;
  evaluations: number;
}

const CANDIDATE_SEPARATION = 0.01;
/**
 * The search aims this far inside every floor (index points, lm/W): a recipe is filed with optical
 * fractions rounded to 4 decimals, which moves R9 of a warm white by about 0.002–0.01, so a proposal
 * found exactly on a floor (R9 50.001) would be filed just under it (49.999). Feasibility is still
 * judged against the floors as given.
 */
export const FLOOR_SEARCH_MARGIN = 0.05;
const fmt = (v: number, d = 4) => v.toFixed(d);

export function solveBlend(problem: SolveProblem): SolveResult {
  const n = problem.components.phosphors.length;
  if (n < 2 || n > 5) throw new BlendInputError(`the solver needs 2–5 phosphors (got ${n})`);
  const floors = problem.floors ?? {};
  const tolerance = problem.tolerance ?? { kind: 'sdcm', steps: 3 };
  const maxCandidates = problem.maxCandidates ?? 3;
  const basis = prepareBasis(problem.components);
  const target = resolveTarget(problem.target);
  const hull = convexHull(basis.components.map((c) => xyzToUvPrime(...c.xyz) as Point));
  const near = nearestInHull(hull, xyToUvPrime(target.x, target.y) as Point);
  const [sx, sy] = near.distance > 0 ? uvPrimeToXy(...near.point) : [target.x, target.y];
  const gapError = colourDistance(sx, sy, target);
  const outOfGamut = near.distance > 0 && !withinTolerance(gapError, tolerance);
  const plane = colourPlane(
    basis.components.map((c) => c.xyz),
    [sx, sy]
  );
  const searchFloors = floorsInside(floors, FLOOR_SEARCH_MARGIN);
  const loop = makeLoopEvaluator(basis, searchFloors, problem.objective, problem.loading);
  const search =
    near.distance > 0
      ? { samples: plane.vertices.map((w) => loop.evaluate(w)), optima: [] as LoopPoint[] }
      : searchPolytope(plane, loop.evaluate, { floors: searchFloors, objective: problem.objective, starts: maxCandidates + 2 });
  const merit = (p: LoopPoint) => meritOf(p, searchFloors, problem.objective);
  const pool = [...search.optima.sort((a, b) => merit(a) - merit(b)), ...search.samples.sort((a, b) => merit(a) - merit(b))];
  const model = spectrumModelOf(basis, problem.loading);
  const realised = model.kind === 'loadingWithReabsorption';
  // Realised finalists are ranked again on their own spectra, so a few spares are built.
  const wanted = realised ? maxCandidates + 2 : maxCandidates;
  const picked: LoopPoint[] = [];
  for (const p of pool) {
    if (picked.length >= wanted) break;
    if (picked.every((q) => distance(q.fractions, p.fractions) >= CANDIDATE_SEPARATION)) picked.push(p);
  }
  picked.sort((a, b) => merit(a) - merit(b));
  const ctx: CandidateContext = {
    basis,
    target,
    tolerance,
    floors,
    objective: problem.objective,
    loading: problem.loading,
    solvedAt: [sx, sy]
  };
  let candidates = picked.map((p) => buildCandidate(ctx, p.fractions));
  if (problem.loading && basis.loading && candidates.length > 0 && candidates.every((c) => c.concentrationsWtPct === null)) {
    const why = candidates[0].violations.find((v) => v.startsWith(NO_RECIPE))?.slice(NO_RECIPE.length);
    throw new LoadingRefusedError(`No proposal can be weighed. ${why ?? 'The loading model cannot produce these mixes.'}`);
  }
  let extraEvaluations = 0;
  if (realised) {
    const candidateMerit = (c: SolveCandidate) =>
      meritOf({ fractions: c.opticalFractions, ...loopMetricsOf(c.evaluation, c.costPer1000Lm) }, searchFloors, problem.objective);
    const byMerit = (list: SolveCandidate[]) =>
      list.filter((c) => c.concentrationsWtPct !== null).sort((a, b) => candidateMerit(a) - candidateMerit(b));
    let weighable = byMerit(candidates);
    if (near.distance === 0) {
      const refined = refineOnLoadingModel(ctx, weighable[0], maxCandidates, 3);
      extraEvaluations = refined.evaluations;
      weighable = byMerit([...weighable, ...refined.candidates]);
    }
    const kept: SolveCandidate[] = [];
    for (const c of weighable) {
      if (kept.length >= maxCandidates) break;
      if (kept.every((k) => distance(k.opticalFractions, c.opticalFractions) >= CANDIDATE_SEPARATION)) kept.push(c);
    }
    candidates = kept;
  }
  candidates = candidates.map((c, i) => ({ ...c, rank: i + 1 }));
  const bestAchievable = bestValues(floors, [...search.samples, ...search.optima]);
  const solvedCct = uvToCct(...xyToUv(sx, sy));
  const base = {
    target: { x: target.x, y: target.y, cct: target.cct, duv: target.duv, label: target.label },
    solvedAt: { x: sx, y: sy, cct: solvedCct.cct, duv: solvedCct.duv },
    bestAchievable,
    evaluations: loop.count() + extraEvaluations,
    model
  };
  if (outOfGamut) {
    candidates.forEach((c) => (c.feasible = false));
    return {
      ...base,
      status: 'unreachable',
      reason:
        `${target.label} (x ${fmt(target.x)}, y ${fmt(target.y)}) lies outside the colour gamut of these components. ` +
        `Nearest reachable point: x ${fmt(sx)}, y ${fmt(sy)} (${Math.round(solvedCct.cct)} K, Duv ${fmt(solvedCct.duv)}), ` +
        `Δu′v′ ${fmt(gapError.deltaUvPrime)} (${gapError.steps.toFixed(1)} SDCM) from the target — beyond the tolerance. ` +
        'Add a component on the far side of the target (e.g. a redder or greener phosphor) or change the target.',
      candidates
    };
  }
  if (!candidates.some((c) => c.feasible)) {
    const parts = FLOOR_RULES.filter((r) => floors[r.key] !== undefined).map(
      (r) => `${r.label} ${r.sense > 0 ? '≥' : '≤'} ${floors[r.key]} (best ${formatFloorValue(r, bestAchievable[r.key])})`
    );
    if (floors.intent) parts.push(`TM-30 design intent ${floors.intent}`);
    return {
      ...base,
      status: 'floorsNotMet',
      reason:
        `No mix of these components at ${target.label} meets all floors: ${parts.join(', ')}. ` +
        'Best values are over all mixes tried, each taken alone; the candidates shown are the closest misses.',
      candidates
    };
  }
  return { ...base, status: 'ok', reason: null, candidates: candidates.filter((c) => c.feasible) };
}

function bestValues(floors: Floors, points: LoopPoint[]): Partial<Record<keyof Floors, number>> {
  const out: Partial<Record<keyof Floors, number>> = {};
  for (const r of FLOOR_RULES) {
    if (floors[r.key] === undefined) continue;
    const vals = points.map((p) => p.metrics[r.metric]).filter((v): v is number => v !== null && Number.isFinite(v));
    if (vals.length) out[r.key] = r.sense > 0 ? Math.max(...vals) : Math.min(...vals);
  }
  return out;
}
