import { describe, expect, it } from 'vitest';
import { opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { ellipseForCct } from '../../../src/lib/spectral/ansi/macadam';
import { xyzToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';
import {
  buildPartModel,
  partXyz,
  seededRandom,
  shareWithinSteps,
  simulateSpread,
  stepsFrom,
  uvPrimeCovariance,
  variationModelSchema
} from '../../../src/lib/blend/spread';
import { PUMP_PEAK_NM, TEST_CONCENTRATIONS, TEST_PATH_MM, testBasis } from './basis';

describe('share inside the n-step ellipse of a bivariate normal spread', () => {
  it('follows the χ² law with 2 degrees of freedom: P(n) = 1 − exp(−n²/2σ²)', () => {
    // If (Δx,Δy) ~ N(0, σ²G⁻¹) with G the ellipse metric, the squared steps ΔᵀGΔ/σ² is χ²(2), whose CDF is
    // 1 − exp(−t/2) (e.g. Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions vol. 1, ch. 18).
    const centre = { x: 0.4578, y: 0.4101, cct: 2700 };
    const e = { ...ellipseForCct(2700), x: centre.x, y: centre.y, steps: 1 };
    const th = (e.thetaDeg * Math.PI) / 180;
    const sigma = 2.5;
    const N = 100_000;
    const rnd = seededRandom(2024);
    const x = new Float64Array(N);
    const y = new Float64Array(N);
    for (let i = 0; i < N; i++) {
      // Δ = σ (a z₁ ê_major + b z₂ ê_minor) has covariance σ²G⁻¹ (a, b the 1-step semi-axes).
      const z1 = rnd.normal() * e.a * sigma;
      const z2 = rnd.normal() * e.b * sigma;
      x[i] = centre.x + z1 * Math.cos(th) - z2 * Math.sin(th);
      y[i] = centre.y + z1 * Math.sin(th) + z2 * Math.cos(th);
    }
    const shares = shareWithinSteps(stepsFrom(x, y, centre, e), [1, 2, 3, 5, 7]);
    for (const { steps, share } of shares) {
      const p = 1 - Math.exp(-(steps * steps) / (2 * sigma * sigma));
      const se = Math.sqrt((p * (1 - p)) / N);
      expect(Math.abs(share - p)).toBeLessThanOrEqual(4 * se + 1e-9);
    }
  });
});

describe('Monte Carlo covariance against first-order propagation', () => {
  it('agrees with the delta method through a finite-difference Jacobian for small variances', () => {
    // Delta method: Cov(f(θ)) ≈ J Σθ Jᵀ for small Σθ (e.g. Casella & Berger, Statistical Inference, 2nd ed., §5.5.4);
    // J by central differences of the same loading model. Sources independent, so Σθ is diagonal.
    const basis = testBasis();
    const part = buildPartModel(basis);
    const tau0 = opticalDepthsOf(basis, TEST_CONCENTRATIONS, TEST_PATH_MM);
    const recipe = { opticalDepths: tau0, pumpPeakNm: PUMP_PEAK_NM };
    const massCv = 0.004;
    const absCv = 0.004;
    const tol = 0.004;
    const pumpSd = 0.3;
    const peakSd = 0.3;
    const uv = (m: number, f: number[], delta: number, s: number[]): [number, number] => {
      const out = new Float64Array(4);
      partXyz(
        part,
        tau0.map((t, i) => t * m * f[i]),
        delta,
        s,
        out
      );
      return xyzToUvPrime(out[0], out[1], out[2]);
    };
    const n = tau0.length;
    const one = Array(n).fill(1);
    const zero = Array(n).fill(0);
    // Each row: a parameter perturbation (h) and its variance.
    const params: { at: (h: number) => [number, number]; variance: number; h: number }[] = [
      { at: (h) => uv(1 + h, one, 0, zero), variance: massCv ** 2, h: 1e-4 },
      { at: (h) => uv(1, one, h, zero), variance: pumpSd ** 2, h: 1e-2 }
    ];
    for (let i = 0; i < n; i++) {
      const f = (h: number): number[] => one.map((v, k) => (k === i ? v + h : v));
      // Weighing (uniform ±tol: variance tol²/3) and absorption lot (CV) both scale τᵢ.
      params.push({ at: (h) => uv(1, f(h), 0, zero), variance: absCv ** 2 + tol ** 2 / 3, h: 1e-4 });
      params.push({
        at: (h) =>
          uv(
            1,
            one,
            0,
            zero.map((v, k) => (k === i ? h : v))
          ),
        variance: peakSd ** 2,
        h: 1e-2
      });
    }
    let cuu = 0;
    let cuv = 0;
    let cvv = 0;
    for (const p of params) {
      const [u1, v1] = p.at(p.h);
      const [u0, v0] = p.at(-p.h);
      const ju = (u1 - u0) / (2 * p.h);
      const jv = (v1 - v0) / (2 * p.h);
      cuu += ju * ju * p.variance;
      cuv += ju * jv * p.variance;
      cvv += jv * jv * p.variance;
    }
    const model = variationModelSchema.parse({
      pump: { kind: 'normal', meanOffsetNm: 0, sigmaNm: pumpSd },
      slurryMassCvPct: massCv * 100,
      weighingTolerancePct: tol * 100,
      absorptionLotCvPct: absCv * 100,
      peakLotSigmaNm: peakSd
    });
    const N = 100_000;
    const cloud = simulateSpread(part, recipe, model, N, 99);
    const [suu, suv, svv] = uvPrimeCovariance(cloud.x, cloud.y);
    // Sampling error of a variance estimate is √(2/N) ≈ 0.45 % at N = 10⁵; allow 4 standard errors.
    const rel = 4 * Math.sqrt(2 / N);
    expect(Math.abs(suu / cuu - 1)).toBeLessThan(rel);
    expect(Math.abs(svv / cvv - 1)).toBeLessThan(rel);
    // Covariance: SE ≈ √((σu²σv² + c²)/N).
    const seCov = Math.sqrt((cuu * cvv + cuv * cuv) / N);
    expect(Math.abs(suv - cuv)).toBeLessThan(4 * seCov);
  });
});
