/**
 * Multi-start search of the equal-chromaticity polytope {w = w₀ + N z, w ≥ 0}.
 *
 * 1. Coarse sample: the polytope's vertices, their centroid, and convex combinations of
 *    the vertices (evenly spaced on a segment when d = 1; Dirichlet(1) weights from a
 *    seeded generator for d ≥ 2, so runs are reproducible). Every sample is feasible in w.
 * 2. Starts: the best samples by merit, at least MIN_START_SEPARATION apart in w.
 * 3. Nelder–Mead (Nelder & Mead 1965) in z from each start with an extreme barrier on
 *    w ≥ 0; merit = −objective when all floors hold, else 1e6 + shortfall (feasibility
 *    first, so a start below a floor climbs to it and then optimises).
 * Returns every evaluated point (for "best achievable" reports) and the local optima.
 */
import { type ColourPlane, coordinatesOf, ratiosAt } from './colourPlane';
import { type Floors, type Objective, objectiveValue, violation } from '../../aim/floors';
import type { LoopEvaluator, LoopPoint } from './loopMetrics';
import { nelderMead } from './nelderMead';

export interface SearchOptions {
  floors: Floors;
  objective: Objective;
  starts: number;
}

export interface SearchOutcome {
  samples: LoopPoint[];
  optima: LoopPoint[];
}

const INFEASIBLE = 1e6;
const NEGATIVE_W = 1e9;
export const MIN_START_SEPARATION = 0.03;
const SAMPLES_BY_DIMENSION = [1, 17, 48, 90];
const EVALS_BY_DIMENSION = [0, 40, 90, 160];

export function meritOf(p: LoopPoint, floors: Floors, objective: Objective): number {
  const v = violation(floors, p.metrics);
  if (v > 0) return INFEASIBLE + v;
  const o = objectiveValue(objective, p.metrics);
  return Number.isFinite(o) ? -o : INFEASIBLE;
}

/** Small deterministic PRNG (mulberry32; T. Ettinger, public domain) for reproducible samples. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const distance = (a: number[], b: number[]): number => Math.max(...a.map((v, i) => Math.abs(v - b[i])));

function combination(vertices: number[][], weights: number[]): number[] {
  const s = weights.reduce((a, b) => a + b, 0);
  return vertices[0].map((_, i) => vertices.reduce((acc, v, k) => acc + (weights[k] / s) * v[i], 0));
}

export function samplePolytope(plane: ColourPlane): number[][] {
  const V = plane.vertices;
  if (V.length === 0) return [];
  const d = Math.min(plane.dimension, 3);
  const count = SAMPLES_BY_DIMENSION[d] ?? 90;
  const out: number[][] = V.map((v) => v.slice());
  if (V.length === 1) return out;
  out.push(
    combination(
      V,
      V.map(() => 1)
    )
  );
  if (plane.dimension === 1 || V.length === 2) {
    const [a, b] = [V[0], V[V.length - 1]];
    for (let i = 1; i < count - 1; i++) out.push(combination([a, b], [1 - i / (count - 1), i / (count - 1)]));
    return out;
  }
  const rnd = mulberry32(0x9e3779b9);
  while (out.length < count)
    out.push(
      combination(
        V,
        V.map(() => -Math.log(1 - rnd()))
      )
    );
  return out;
}

export function searchPolytope(plane: ColourPlane, evaluate: LoopEvaluator, opts: SearchOptions): SearchOutcome {
  const merit = (p: LoopPoint) => meritOf(p, opts.floors, opts.objective);
  const samples = samplePolytope(plane).map((w) => evaluate(w));
  if (plane.dimension === 0 || plane.vertices.length <= 1) return { samples, optima: samples.slice(0, 1) };
  const ranked = samples.slice().sort((a, b) => merit(a) - merit(b));
  const starts: LoopPoint[] = [];
  for (const p of ranked) {
    if (starts.length >= opts.starts) break;
    if (starts.every((s) => distance(s.fractions, p.fractions) >= MIN_START_SEPARATION)) starts.push(p);
  }
  const zs = plane.vertices.map((v) => coordinatesOf(plane, v));
  const step = Array.from({ length: plane.dimension }, (_, j) => {
    const vals = zs.map((z) => z[j]);
    return Math.max(1e-4, 0.1 * (Math.max(...vals) - Math.min(...vals)));
  });
  const budget = EVALS_BY_DIMENSION[Math.min(plane.dimension, 3)];
  const optima: LoopPoint[] = [];
  for (const s of starts) {
    let best = s;
    let bestMerit = merit(s);
    const fn = (z: number[]): number => {
      const w = ratiosAt(plane, z);
      const neg = Math.min(...w);
      if (neg < -1e-12) return NEGATIVE_W - neg;
      const p = evaluate(w.map((v) => Math.max(0, v)));
      const m = merit(p);
      if (m < bestMerit) {
        best = p;
        bestMerit = m;
      }
      return m;
    };
    nelderMead(fn, coordinatesOf(plane, s.fractions), { step, maxEvaluations: budget, fTolerance: 1e-7, xTolerance: 1e-7 });
    optima.push(best);
  }
  return { samples, optima };
}
