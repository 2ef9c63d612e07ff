/**
 * Nelder–Mead downhill simplex minimisation (J. A. Nelder & R. Mead, "A simplex method
 * for function minimization", Comput. J. 7 (1965) 308–313), standard coefficients
 * reflection 1, expansion 2, contraction ½, shrink ½ (as in Lagarias et al., SIAM J.
 * Optim. 9 (1998) 112–147). Used with an extreme barrier: infeasible points return
 * +Infinity or a large penalty, so the simplex never settles outside the feasible set
 * when it starts inside it.
 */
export interface NelderMeadOptions {
  /** Initial simplex edge along each axis. */
  step: number[];
  maxEvaluations?: number;
  /** Stop when the simplex's function spread and size fall below these. */
  fTolerance?: number;
  xTolerance?: number;
}

export interface NelderMeadResult {
  x: number[];
  f: number;
  evaluations: number;
}

export function nelderMead(fn: (x: number[]) => number, x0: number[], opts: NelderMeadOptions): NelderMeadResult {
  const d = x0.length;
  const maxEval = opts.maxEvaluations ?? 200 * d;
  const fTol = opts.fTolerance ?? 1e-6;
  const xTol = opts.xTolerance ?? 1e-7;
  let evals = 0;
  const f = (x: number[]): number => {
    evals++;
    const v = fn(x);
    return Number.isNaN(v) ? Infinity : v;
  };
  let simplex: { x: number[]; f: number }[] = [{ x: x0.slice(), f: f(x0) }];
  for (let i = 0; i < d; i++) {
    const x = x0.slice();
    x[i] += opts.step[i];
    simplex.push({ x, f: f(x) });
  }
  const combine = (a: number[], b: number[], t: number): number[] => a.map((ai, i) => ai + t * (b[i] - ai));
  while (evals < maxEval) {
    simplex.sort((a, b) => a.f - b.f);
    const best = simplex[0];
    const worst = simplex[d];
    const size = Math.max(...simplex.slice(1).map((s) => Math.max(...s.x.map((v, i) => Math.abs(v - best.x[i])))));
    if (Math.abs(worst.f - best.f) <= fTol * (Math.abs(best.f) + 1e-12) && size <= xTol * 1e3) break;
    if (size <= xTol) break;
    const centroid = new Array<number>(d).fill(0);
    for (let k = 0; k < d; k++) for (let i = 0; i < d; i++) centroid[i] += simplex[k].x[i] / d;
    const xr = combine(centroid, worst.x, -1);
    const fr = f(xr);
    if (fr < best.f) {
      const xe = combine(centroid, worst.x, -2);
      const fe = f(xe);
      simplex[d] = fe < fr ? { x: xe, f: fe } : { x: xr, f: fr };
    } else if (fr < simplex[d - 1].f) {
      simplex[d] = { x: xr, f: fr };
    } else {
      const outside = fr < worst.f;
      const xc = outside ? combine(centroid, xr, 0.5) : combine(centroid, worst.x, 0.5);
      const fc = f(xc);
      if (fc < (outside ? fr : worst.f)) {
        simplex[d] = { x: xc, f: fc };
      } else {
        simplex = simplex.map((s, k) => {
          if (k === 0) return s;
          const x = combine(best.x, s.x, 0.5);
          return { x, f: f(x) };
        });
      }
    }
  }
  simplex.sort((a, b) => a.f - b.f);
  return { x: simplex[0].x, f: simplex[0].f, evaluations: evals };
}
