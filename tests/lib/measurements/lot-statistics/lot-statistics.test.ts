import { describe, expect, it } from 'vitest';
import { randomLcg, randomNormal } from 'd3';
import {
  capabilityIndices,
  consecutiveGroups,
  driftSlope,
  ellipseCovers,
  fQuantileTwoNumeratorDf,
  meanAndCovariance,
  meanConfidenceEllipse
} from '../../../../src/lib/measurements/lot-statistics/index';

describe('process capability (NIST/SEMATECH e-Handbook §6.1.6)', () => {
  it('hand-computed set 1,2,3,4,5 with LSL 0, USL 9', () => {
    // By hand: μ = 3, s = √(10/4) = 1.58114; Cpu = 6/(3·1.58114) = 1.26491; Cpl = 3/4.74342 = 0.63246;
    // Cp = 9/(6·1.58114) = 0.94868; Cpk = min = 0.63246.
    const c = capabilityIndices(3, Math.sqrt(2.5), 0, 9);
    expect(c.cpu).toBeCloseTo(1.26491, 4);
    expect(c.cpl).toBeCloseTo(0.63246, 4);
    expect(c.cp).toBeCloseTo(0.94868, 4);
    expect(c.cpk).toBeCloseTo(0.63246, 4);
  });
  it('one-sided upper limit: Cpk = Cpu, no Cp', () => {
    // By hand: (0.003 − 0.001)/(3·0.0005) = 1.3333.
    const c = capabilityIndices(0.001, 0.0005, null, 0.003);
    expect(c.cpk).toBeCloseTo(1.3333, 4);
    expect(c.cp).toBeNull();
  });
});

describe('F quantile with 2 numerator df (standard F tables, α = 0.05)', () => {
  // Printed F table values (e.g. NIST/SEMATECH e-Handbook §1.3.6.7.3), rounded to 2 decimals.
  for (const [df, table] of [
    [3, 9.55],
    [10, 4.1],
    [30, 3.32],
    [120, 3.07]
  ])
    it(`F(2, ${df}, 0.95) = ${table}`, () => expect(fQuantileTwoNumeratorDf(df, 0.95)).toBeCloseTo(table, 2));
});

describe('Hotelling T² confidence ellipse of the mean (Johnson & Wichern 2007, §5.4)', () => {
  it('hand-computed five points', () => {
    // Points (0,0),(2,1),(1,1),(3,2),(4,1): mean (2,1); Sxx = 10/4 = 2.5, Syy = 2/4 = 0.5, Sxy = 3/4 = 0.75.
    // Eigenvalues 1.5 ± √(1 + 0.5625) = 2.75, 0.25; angle ½·atan2(1.5, 2) = 18.435°.
    // c² = 2·4/(5·3)·F(2,3,0.95) = (8/15)·9.55 (F table); semi-axes √(2.75 c²), √(0.25 c²).
    const pts = [
      [0, 0],
      [2, 1],
      [1, 1],
      [3, 2],
      [4, 1]
    ].map(([x, y]) => ({ x, y }));
    const e = meanConfidenceEllipse(pts, 0.95)!;
    expect(e.mean).toEqual({ x: 2, y: 1 });
    expect(e.covariance.xx).toBeCloseTo(2.5, 12);
    expect(e.covariance.yy).toBeCloseTo(0.5, 12);
    expect(e.covariance.xy).toBeCloseTo(0.75, 12);
    expect(e.angleDeg).toBeCloseTo(18.435, 3);
    expect(e.semiMajor).toBeCloseTo(Math.sqrt(2.75 * (8 / 15) * 9.55), 2);
    expect(e.semiMinor).toBeCloseTo(Math.sqrt(0.25 * (8 / 15) * 9.55), 2);
  });

  // Correlated normal pairs by Cholesky of a known covariance (common practice), seeded.
  const MU = { x: 0.437, y: 0.404 };
  const SX = 0.002;
  const SY = 0.0015;
  const RHO = 0.6;
  function lot(n: number, seed: number) {
    const z = randomNormal.source(randomLcg(seed))(0, 1);
    return Array.from({ length: n }, () => {
      const a = z();
      const b = z();
      return { x: MU.x + SX * a, y: MU.y + SY * (RHO * a + Math.sqrt(1 - RHO * RHO) * b) };
    });
  }

  it('100,000-part synthetic lot gives back mean and covariance within sampling error', () => {
    const n = 100_000;
    const m = meanAndCovariance(lot(n, 0.12345));
    // Standard errors (common practice): mean σ/√n; variance σ²√(2/(n−1)); covariance √((σx²σy² + σxy²)/(n−1)); 5 SE bounds.
    expect(Math.abs(m.mean.x - MU.x)).toBeLessThan((5 * SX) / Math.sqrt(n));
    expect(Math.abs(m.mean.y - MU.y)).toBeLessThan((5 * SY) / Math.sqrt(n));
    expect(Math.abs(m.xx - SX * SX)).toBeLessThan(5 * SX * SX * Math.sqrt(2 / (n - 1)));
    expect(Math.abs(m.yy - SY * SY)).toBeLessThan(5 * SY * SY * Math.sqrt(2 / (n - 1)));
    const sxy = RHO * SX * SY;
    expect(Math.abs(m.xy - sxy)).toBeLessThan(5 * Math.sqrt((SX * SX * SY * SY + sxy * sxy) / (n - 1)));
  });

  it('covers the true mean about 95 % of the time over 2,000 seeded lots of 10', () => {
    const lots = 2000;
    let covered = 0;
    for (let i = 0; i < lots; i++) if (ellipseCovers(meanConfidenceEllipse(lot(10, i / lots))!, MU)) covered++;
    // Binomial bounds (common practice): 0.95 ± 3.5·√(0.95·0.05/2000) = 0.95 ± 0.017.
    expect(covered / lots).toBeGreaterThan(0.933);
    expect(covered / lots).toBeLessThan(0.967);
  });
});

describe('trend over the run (Montgomery & Runger 2014, §11-2, §11-4.1)', () => {
  it('hand-computed slope and standard error', () => {
    // x = 0..3, y = 1,3,2,4: Sxx = 5, Sxy = 4, slope 0.8; residuals −.3,.9,−.9,.3, SSE 1.8, σ̂² 0.9, se √(0.9/5) = 0.42426.
    const d = driftSlope([1, 3, 2, 4])!;
    expect(d.slope).toBeCloseTo(0.8, 12);
    expect(d.se).toBeCloseTo(0.42426, 5);
  });
  it('consecutive groups: 10 parts in 5 groups of 2; 1,000 parts in 50 of 20 (common practice)', () => {
    expect(consecutiveGroups(10)).toEqual([
      [0, 1],
      [2, 3],
      [4, 5],
      [6, 7],
      [8, 9]
    ]);
    const g = consecutiveGroups(1000);
    expect(g.length).toBe(50);
    expect(g.every(([a, b]) => b - a + 1 === 20)).toBe(true);
  });
});
