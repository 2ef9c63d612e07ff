import { describe, expect, it } from 'vitest';
import { miredSteps, referenceLines, spectralXy } from '../../../src/lib/charts/chromaticity-loci';
import { xyToUv, xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';

describe('spectral locus (CIE 1931 2° observer)', () => {
  // CIE 15:2004 Table T.2-type values of the spectrum locus, 4 decimals [from memory]:
  const cases = [
    { nm: 500, x: 0.0082, y: 0.5384 },
    { nm: 520, x: 0.0743, y: 0.8338 },
    { nm: 560, x: 0.3731, y: 0.6245 },
    { nm: 600, x: 0.627, y: 0.3725 }
  ];
  for (const c of cases) {
    it(`${c.nm} nm is at x ${c.x}, y ${c.y}`, () => {
      const [x, y] = spectralXy(c.nm);
      expect(x).toBeCloseTo(c.x, 3);
      expect(y).toBeCloseTo(c.y, 3);
    });
  }

  it('runs 380–700 nm at 1 nm and carries the wavelength labels in the chosen plane', () => {
    const xy = referenceLines('xy');
    expect(xy.spectralLocus).toHaveLength(321);
    const label = referenceLines('uv').locusLabels.find((l) => l.wavelengthNm === 560)!;
    const [u, v] = xyToUvPrime(...spectralXy(560));
    expect(label.at[0]).toBeCloseTo(u, 12);
    expect(label.at[1]).toBeCloseTo(v, 12);
  });
});

describe('Planckian locus, isotherms and Duv lines', () => {
  // CIE 15:2004 Table T.3: illuminant A x,y = (0.44757, 0.40745). A is a Planck radiator at 2856 K
  // with c2 = 1.4350e-2 m·K; with today's c2 = 1.4388e-2 the same spectrum is at
  // 2856 · 1.4388/1.4350 = 2863.56 K (hand-worked).
  it('passes through illuminant A', () => {
    const pts = referenceLines('xy').planckian;
    const toSegment = (p: number[], a: number[], b: number[]) => {
      const t = Math.max(
        0,
        Math.min(1, ((p[0] - a[0]) * (b[0] - a[0]) + (p[1] - a[1]) * (b[1] - a[1])) / ((b[0] - a[0]) ** 2 + (b[1] - a[1]) ** 2))
      );
      return Math.hypot(p[0] - a[0] - t * (b[0] - a[0]), p[1] - a[1] - t * (b[1] - a[1]));
    };
    const nearest = Math.min(...pts.slice(1).map((b, i) => toSegment([0.44757, 0.40745], pts[i], b)));
    expect(nearest).toBeLessThan(1e-4); // the drawn polyline (chords in mired steps) passes within 1e-4 of A
  });

  it('draws each isotherm 0.02 either side of the locus in CIE 1960 u,v', () => {
    for (const iso of referenceLines('xy').isotherms) {
      const [u0, v0] = xyToUv(...iso.from);
      const [u1, v1] = xyToUv(...iso.to);
      // Ohno 2014 §4: Duv is the signed distance along the normal; the two ends are 2 × 0.02 apart.
      expect(Math.hypot(u1 - u0, v1 - v0)).toBeCloseTo(0.04, 9);
    }
  });

  it('puts the Duv lines where Duv is ±0.01 and ±0.02', () => {
    expect(referenceLines('uv').duvLines.map((l) => l.duv)).toEqual([-0.02, -0.01, 0.01, 0.02]);
  });

  it('spaces temperatures evenly in mired', () => {
    const t = miredSteps(2000, 4000, 3);
    expect(t[0]).toBeCloseTo(2000, 9);
    expect(t[1]).toBeCloseTo(1e6 / 375, 9); // (500 + 250)/2 = 375 mired
    expect(t[2]).toBeCloseTo(4000, 9);
  });
});
