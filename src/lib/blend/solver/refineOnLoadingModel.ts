/**
 * Second search round with re-absorption: the search is repeated on the loading model
 * linearised at the best realised recipe, so floors and the objective are met on the light
 * the wt % will give, not only on the optical superposition.
 *
 * At fixed optical depths τ* the loading-model output is a sum of component spectra (pump
 * leak and each phosphor's escaping plus re-emitted light; `componentSpd`). Near τ* a mix is
 * close to a superposition of those effective components (successive linearisation, as in
 * Gauss–Newton: Dennis & Schnabel 1983, §10.2), so the colour plane and Nelder–Mead search of
 * the first round run unchanged on that basis. Every finalist is then realised exactly on the
 * loading model (`realiseOnLoadingModel`, starting from the inverse with re-absorption) before it
 * is scored, so nothing reported comes from the linearisation.
 */
import { type Basis, tristimulus } from '../basis';
import { centroidNm } from '../grid';
import { beerLambertPhotonBudget, type LoadingResult } from '../loading/beerLambertPhotonBudget';
import type { LoadingParams } from '../types';
import { type CandidateContext, type SolveCandidate, buildCandidate } from './buildCandidate';
import { colourPlane } from './colourPlane';
import { makeLoopEvaluator, type LoopPoint } from './loopMetrics';
import { distance, meritOf, searchPolytope } from './searchPolytope';

/** The basis whose components are the loading model's output spectra at one recipe. */
export function effectiveBasisAt(basis: Basis, result: LoadingResult): Basis {
  const components = basis.components.map((c, k) => {
    const power = result.componentPower[k];
    if (!(power > 0)) return c;
    const spd = result.componentSpd[k].map((v) => v / power);
    return { ...c, spd, xyz: tristimulus(spd), centroidNm: centroidNm(spd) };
  });
  return { ...basis, components };
}

export function loadingResultOf(basis: Basis, loading: LoadingParams, concentrationsWtPct: number[]): LoadingResult {
  const geometry = { geometry: loading.geometry, siliconeDensityGPerCm3: loading.siliconeDensityGPerCm3 };
  const { pathLengthMm, cascade, cascadePathFactor } = loading;
  return beerLambertPhotonBudget(basis.loading!, concentrationsWtPct, pathLengthMm, cascade ?? false, cascadePathFactor ?? 1, geometry);
}

export interface Refinement {
  candidates: SolveCandidate[];
  samples: LoopPoint[];
  evaluations: number;
}

export function refineOnLoadingModel(ctx: CandidateContext, best: SolveCandidate, wanted: number, starts: number): Refinement {
  const loading = ctx.loading as LoadingParams;
  const eff = effectiveBasisAt(ctx.basis, loadingResultOf(ctx.basis, loading, best.concentrationsWtPct as number[]));
  const plane = colourPlane(
    eff.components.map((c) => c.xyz),
    ctx.solvedAt ?? [ctx.target.x, ctx.target.y]
  );
  const loop = makeLoopEvaluator(eff, ctx.floors, ctx.objective, loading);
  const search = searchPolytope(plane, loop.evaluate, { floors: ctx.floors, objective: ctx.objective, starts });
  const merit = (p: LoopPoint) => meritOf(p, ctx.floors, ctx.objective);
  const pool = [...search.optima.sort((a, b) => merit(a) - merit(b)), ...search.samples.sort((a, b) => merit(a) - merit(b))];
  const picked: LoopPoint[] = [];
  for (const p of pool) {
    if (picked.length >= wanted) break;
    if (picked.every((q) => distance(q.fractions, p.fractions) >= 0.01)) picked.push(p);
  }
  const onModel: CandidateContext = { ...ctx, fractionsOnLoadingModel: true };
  return {
    candidates: picked.map((p) => buildCandidate(onModel, p.fractions)),
    samples: [...search.samples, ...search.optima],
    evaluations: loop.count()
  };
}
