import { describe, expect, it } from 'vitest';
import { daylightSpd, evaluateSpectrum, planckSpd, tcsDisplayXyzD65, cctDuvToUv } from '../../src/lib/spectral/index';
import { gridSpd, bandsSpd } from './helpers';

describe('CIE 13.3-1995 §5.2 reference illuminant and definitions', () => {
  const cases = [
    {
      name: 'Planckian 4990 K',
      input: gridSpd(planckSpd(4990)),
      expected: { reference: 'planckian', ra: 100 },
      tol: 0.01,
      source: 'CIE 13.3 §5.2: Planckian below 5000 K; Ra = 100 by definition'
    },
    {
      name: 'daylight 5010 K',
      input: gridSpd(daylightSpd(5010)),
      expected: { reference: 'daylight', ra: 100 },
      tol: 0.05,
      source:
        'CIE 13.3 §5.2: daylight from 5000 K; Ra = 100 by definition (tol: the CCT of D ' +
        'at nominal T differs by a few K, so the reference is daylight at that CCT)'
    },
    {
      name: 'Planckian 2700 K',
      input: gridSpd(planckSpd(2700)),
      expected: { reference: 'planckian', ra: 100 },
      tol: 0.01,
      source: 'CIE 13.3: Ra = 100 by definition'
    },
    {
      name: 'daylight 6504 K',
      input: gridSpd(daylightSpd(6504)),
      expected: { reference: 'daylight', ra: 100 },
      tol: 0.05,
      source: 'CIE 13.3: Ra = 100 by definition'
    }
  ];
  it.each(cases)('$name', ({ input, expected, tol }) => {
    const e = evaluateSpectrum(input);
    expect(e.cri.reference).toBe(expected.reference);
    expect(Math.abs(e.cri.ra - expected.ra)).toBeLessThanOrEqual(tol);
    for (const r of e.cri.ri) expect(Math.abs(r - 100)).toBeLessThanOrEqual(tol);
    expect(e.cri.valid).toBe(true);
  });

  it('4990 K source really has CCT < 5000 K and 5010 K daylight has CCT ≥ 5000 K', () => {
    expect(evaluateSpectrum(gridSpd(planckSpd(4990))).cct).toBeLessThan(5000);
    expect(evaluateSpectrum(gridSpd(daylightSpd(5010))).cct).toBeGreaterThanOrEqual(5000);
  });
});

describe('CIE 13.3 §5.3 DC validity flag (DC < 5.4e-3)', () => {
  it('a source well off the locus is flagged not valid', () => {
    // Strongly greenish two-band source.
    const e = evaluateSpectrum(
      bandsSpd([
        [450, 20, 0.6],
        [545, 60, 2]
      ])
    );
    expect(Math.abs(e.duv)).toBeGreaterThan(0.0054);
    expect(e.cri.dc).toBeGreaterThan(5.4e-3);
    expect(e.cri.valid).toBe(false);
  });
  it('DC equals |Duv| closely (both are 1960 u,v distances to the reference)', () => {
    const e = evaluateSpectrum(
      bandsSpd([
        [450, 20, 1],
        [560, 110, 1.7],
        [630, 80, 0.6]
      ])
    );
    expect(Math.abs(e.cri.dc - Math.abs(e.duv))).toBeLessThan(2e-4);
  });
  it('DC of a point offset by Duv 0.003 from Planck is valid', () => {
    expect(cctDuvToUv(3000, 0.003)).toHaveLength(2);
    const e = evaluateSpectrum(gridSpd(planckSpd(3000)));
    expect(e.cri.dc).toBeLessThan(1e-4);
  });
});

describe('TCS display colours under D65 (approximate, for swatches)', () => {
  it('returns 14 XYZ triplets with 0 < Y < 1 (white Y = 1)', () => {
    const swatches = tcsDisplayXyzD65();
    expect(swatches).toHaveLength(14);
    for (const s of swatches) {
      expect(s.xyzD65[1]).toBeGreaterThan(0);
      expect(s.xyzD65[1]).toBeLessThan(1);
    }
    // TCS09 is the strong red: X/Y well above that of the D65 white (0.9505), common practice.
    const r9 = swatches[8].xyzD65;
    expect(r9[0] / r9[1]).toBeGreaterThan(1.2);
  });
});
