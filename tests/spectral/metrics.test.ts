import { describe, expect, it } from 'vitest';
import { evaluateSpectrum, KM_LM_PER_W } from '../../src/lib/spectral/index';
import { CIE1931_2DEG_CMF } from '../../src/lib/spectral/data/cie1931-2deg-cmf';
import { bandsSpd } from './helpers';

describe('LER, 683.002 lm/W · ΣVS/ΣS over 360–830 nm (CIE 15:2004; K_m from CIE 018:2019)', () => {
  it('monochromatic 555 nm → K_m · V(555) = 683.0 lm/W (V(555) = 1.000 in the CIE 1931 table)', () => {
    const wavelengths = [550, 551, 552, 553, 554, 555, 556, 557, 558, 559, 560];
    const values = wavelengths.map((w) => (w === 555 ? 1 : 0));
    const { ler } = evaluateSpectrum({ wavelengths, values }, { cri: false, tm30: false });
    // linear resampling keeps a 1 nm triangle; V varies < 0.01 % within ±1 nm of 555 nm
    expect(Math.abs(ler - 683.002)).toBeLessThan(0.1);
  });
  it('equal-energy spectrum: K_m · Σȳ / 471 from the CIE 1931 table (independent sum)', () => {
    const sumY = CIE1931_2DEG_CMF.yBar.reduce((s, v) => s + v, 0);
    const expected = (683.002 * sumY) / CIE1931_2DEG_CMF.yBar.length;
    const wavelengths = Array.from({ length: 471 }, (_, i) => 360 + i);
    const { ler } = evaluateSpectrum({ wavelengths, values: wavelengths.map(() => 1) });
    expect(Math.abs(ler - expected)).toBeLessThan(1e-9);
    // Over 380–780 nm the same spectrum gives ≈ 183 lm/W (from memory); over 360–830 it is lower.
    expect(ler).toBeLessThan(183);
    expect(KM_LM_PER_W).toBe(683.002);
  });
});

describe('peak, centroid, FWHM (common practice)', () => {
  const cases = [
    {
      name: 'Gaussian 450 nm, FWHM 20 nm',
      input: bandsSpd([[450, 20, 1]]),
      expected: { peak: 450, centroid: 450, fwhm: 20 },
      tol: 0.1,
      source: 'Gaussian: FWHM = 2.3548 σ'
    },
    {
      name: 'Gaussian 630 nm, FWHM 80 nm',
      input: bandsSpd([[630, 80, 1]]),
      expected: { peak: 630, centroid: 630, fwhm: 80 },
      tol: 0.2,
      source: 'Gaussian: FWHM = 2.3548 σ'
    }
  ];
  it.each(cases)('$name', ({ input, expected, tol }) => {
    const e = evaluateSpectrum(input, { cri: false, tm30: false });
    expect(Math.abs(e.peakNm - expected.peak)).toBeLessThanOrEqual(tol);
    expect(Math.abs(e.centroidNm - expected.centroid)).toBeLessThanOrEqual(tol);
    expect(Math.abs(e.fwhmNm - expected.fwhm)).toBeLessThanOrEqual(tol);
  });
});

describe('fast path options', () => {
  it('skips CRI and TM-30 when asked', () => {
    const e = evaluateSpectrum(
      bandsSpd([
        [450, 20, 1],
        [560, 110, 1.5]
      ]),
      { tm30: false }
    );
    expect(e.tm30).toBeNull();
    expect(e.cri?.ri).toHaveLength(14);
  });
});
