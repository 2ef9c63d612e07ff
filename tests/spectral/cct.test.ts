import { describe, expect, it } from 'vitest';
import {
  cctDuvToUv,
  cctDuvToXy,
  daylightCoefficients,
  planckianUv,
  uvToCct,
  uvToCctOhno2014,
  uvToCctRobertson1968,
  xyToUv
} from '../../src/lib/spectral/index';
import { robertsonLines } from '../../src/lib/spectral/cct/robertson1968';

const temps = [1500, 1800, 2200, 2700, 3000, 3500, 4000, 5000, 5700, 6500, 8000, 10000, 12500, 15000];

describe('Ohno 2014 on the Planckian locus (LEUKOS 10:47; accuracy claim ±1 K)', () => {
  it.each(temps.map((t) => ({ name: `${t} K`, input: t, expected: t, tol: 0.5, source: 'definition of CCT, CIE 15:2004' })))(
    'Planck($name) → CCT within 0.5 K, Duv ≈ 0',
    ({ input, expected, tol }) => {
      const [u, v] = planckianUv(input);
      const r = uvToCctOhno2014(u, v);
      expect(Math.abs(r.cct - expected)).toBeLessThanOrEqual(tol);
      expect(Math.abs(r.duv)).toBeLessThan(1e-5);
    }
  );
});

describe('inverse (CCT, Duv) → u,v → (CCT, Duv) round trip (Ohno 2014 §4)', () => {
  const duvs = [-0.03, -0.02, -0.006, -0.0015, 0, 0.001, 0.0025, 0.006, 0.02, 0.03];
  const ts = [1000, 1700, 2700, 4000, 6500, 10000, 15000, 20000];
  const cases = ts.flatMap((t) =>
    duvs.map((d) => ({
      name: `${t} K, Duv ${d}`,
      input: [t, d],
      tol: { cctK: 1, duv: 1e-5 },
      source: 'Ohno 2014: within 1 K for |Duv| ≤ 0.03'
    }))
  );
  it.each(cases)('$name', ({ input: [t, d], tol }) => {
    const [u, v] = cctDuvToUv(t, d);
    const r = uvToCctOhno2014(u, v);
    expect(Math.abs(r.cct - t)).toBeLessThanOrEqual(tol.cctK);
    expect(Math.abs(r.duv - d)).toBeLessThanOrEqual(tol.duv);
  });
  it('x,y inverse agrees with u,v inverse', () => {
    const [x, y] = cctDuvToXy(3000, 0.004);
    const [u, v] = xyToUv(x, y);
    const [u2, v2] = cctDuvToUv(3000, 0.004);
    expect(Math.hypot(u - u2, v - v2)).toBeLessThan(1e-12);
  });
});

describe('Duv sign (ANSI C78.377: + above the locus, − below)', () => {
  it.each([2700, 4000, 6500].map((t) => ({ name: `${t} K`, input: t })))('$name', ({ input }) => {
    const [u, v] = planckianUv(input);
    expect(uvToCctOhno2014(u, v + 0.005).duv).toBeGreaterThan(0);
    expect(uvToCctOhno2014(u, v - 0.005).duv).toBeLessThan(0);
  });
});

describe('Robertson 1968 (JOSA 58:1528) cross-check against Ohno 2014', () => {
  // Near the locus both find the same isotemperature line; Robertson interpolates linearly in
  // mired between lines 10–25 mired apart, so agreement is stated in mired (0.1 mired = 2.5 K at
  // 5000 K, 22 K at 15000 K).
  const cases = [2000, 2700, 3500, 4500, 6500, 9000, 15000].flatMap((t) =>
    [-0.01, 0, 0.01].map((d) => ({ name: `${t} K, Duv ${d}`, input: [t, d], tol: 0.1, source: 'method agreement' }))
  );
  it.each(cases)('$name', ({ input: [t, d], tol }) => {
    const [u, v] = cctDuvToUv(t, d);
    const rob = uvToCctRobertson1968(u, v);
    const ohno = uvToCct(u, v, 'ohno2014').cct;
    expect(Math.abs(1e6 / rob - 1e6 / ohno)).toBeLessThanOrEqual(tol);
  });
  it('regenerated isotemperature lines match the printed 1968 table (from memory)', () => {
    // Robertson 1968 Table 1 / Wyszecki & Stiles Table 1(3.11), values FROM MEMORY; the printed
    // table used an older c2, hence a tolerance of a few units in the 4th–5th decimal.
    const printed = [
      { mired: 0, u: 0.18006, v: 0.26352, t: -0.24341 },
      { mired: 100, u: 0.19032, v: 0.29326, t: -0.47888 },
      { mired: 300, u: 0.2401, v: 0.34308, t: -2.0637 },
      { mired: 600, u: 0.33724, v: 0.36051, t: -116.45 }
    ];
    const lines = robertsonLines();
    for (const p of printed) {
      const l = lines.find((x) => Math.round(x.mired) === p.mired);
      expect(l).toBeDefined();
      expect(Math.abs((l?.u ?? 0) - p.u)).toBeLessThan(5e-5);
      expect(Math.abs((l?.v ?? 0) - p.v)).toBeLessThan(5e-5);
      expect(Math.abs((l?.t ?? 0) / p.t - 1)).toBeLessThan(0.005);
    }
  });
});

describe('CIE daylight, CIE 15:2004 eq. 3.3–3.4', () => {
  it('xD, yD at 6504 K are the D65 white point (x 0.31272, y 0.32903; CIE 15:2004, from memory)', () => {
    const { xD, yD } = daylightCoefficients(6504);
    expect(Math.abs(xD - 0.31272)).toBeLessThan(0.0001);
    expect(Math.abs(yD - 0.32903)).toBeLessThan(0.0001);
  });
});
