import { describe, expect, it } from 'vitest';
import { levenbergMarquardt } from '../../src/lib/blend/calibration/levenbergMarquardt';

// Stopping tests after Moré, "The Levenberg–Marquardt algorithm: implementation and theory"
// (1978): `converged` only when a step-size, gradient, error-decrease or residual test is met;
// otherwise the reason it stopped.
describe('Levenberg–Marquardt reports convergence honestly (Levenberg 1944; Marquardt 1963; Moré 1978)', () => {
  // Rosenbrock's function as residuals r = (10(y − x²), 1 − x), minimum 0 at (1, 1)
  // (Rosenbrock, Comput. J. 3 (1960) 175; the standard start is (−1.2, 1)).
  const rosenbrock = ([x, y]: number[]) => [10 * (y - x * x), 1 - x];

  it('Rosenbrock from (−1.2, 1): converges to (1, 1) and says which test stopped it', () => {
    const r = levenbergMarquardt(rosenbrock, [-1.2, 1], { maxIterations: 200 });
    expect(r.converged).toBe(true);
    expect(['small error decrease', 'small step', 'small gradient', 'residual below tolerance']).toContain(r.reason);
    expect(r.params[0]).toBeCloseTo(1, 5);
    expect(r.params[1]).toBeCloseTo(1, 5);
  });

  it('stopped early: not converged, reason "max iterations"', () => {
    const r = levenbergMarquardt(rosenbrock, [-1.2, 1], { maxIterations: 2 });
    expect(r.converged).toBe(false);
    expect(r.reason).toBe('max iterations');
  });

  it('a parameter that does not change the residuals: "singular Jacobian", not converged', () => {
    const r = levenbergMarquardt(([a, _unused]) => [a - 2, a + 1, 3], [0, 7]);
    expect(r.converged).toBe(false);
    expect(r.reason).toBe('singular Jacobian');
  });

  it('a kink where the forward-difference slope points uphill: "no step reduces the error", not converged', () => {
    // r(p) = |p| + 1 at p = 0: the forward difference sees slope +1, every step to p < 0 raises the error.
    const r = levenbergMarquardt(([p]) => [Math.abs(p) + 1], [0]);
    expect(r.converged).toBe(false);
    expect(r.reason).toBe('no step reduces the error');
  });

  it('a non-zero-residual minimum (linear fit of a scattered line): converged with the least-squares slope', () => {
    // y = (1, 1, 5, 5) at x = 0..3: ordinary least squares gives slope Sxy/Sxx = 8/5 = 1.6 and
    // intercept ȳ − 1.6·x̄ = 0.6 (normal equations, any regression textbook).
    const xs = [0, 1, 2, 3];
    const ys = [1, 1, 5, 5];
    const r = levenbergMarquardt(([a, b]) => xs.map((x, i) => a + b * x - ys[i]), [0, 0]);
    expect(r.converged).toBe(true);
    expect(r.params[0]).toBeCloseTo(0.6, 6);
    expect(r.params[1]).toBeCloseTo(1.6, 6);
  });
});
