import { describe, expect, it } from 'vitest';
import { summariseSpectrum } from '../../../src/lib/library/spectrum-summary';

const grid = (f: (nm: number) => number, from = 360, to = 830, step = 1) => {
  const wavelengths: number[] = [];
  for (let l = from; l <= to; l += step) wavelengths.push(l);
  return { wavelengths, values: wavelengths.map(f) };
};

describe('library spectrum summary', () => {
  it('equal-energy spectrum: x = y = 1/3 (CIE 15:2004, illuminant E) and CCT near 5455 K (from memory)', () => {
    const s = summariseSpectrum(grid(() => 1));
    expect(s.x).toBeCloseTo(1 / 3, 3);
    expect(s.y).toBeCloseTo(1 / 3, 3);
    expect(s.cctK).not.toBeNull();
    expect(Math.abs(s.cctK! - 5455)).toBeLessThan(15);
  });

  it('Gaussian band: peak at its centre and FWHM 2·w·√ln2 (hand-worked: w = 40 nm → 66.60 nm)', () => {
    const s = summariseSpectrum(grid((l) => Math.exp(-(((l - 540) / 40) ** 2))));
    expect(s.peakNm).toBeCloseTo(540, 1);
    expect(s.fwhmNm).toBeCloseTo(66.6, 0);
    expect(s.centroidNm).toBeCloseTo(540, 0);
  });

  it('gives no CCT for a saturated colour far from the Planckian locus (a narrow 631 nm line)', () => {
    const s = summariseSpectrum(grid((l) => Math.exp(-(((l - 631) / 4) ** 2))));
    expect(s.cctK).toBeNull();
    expect(s.duv).toBeNull();
    expect(s.x).toBeGreaterThan(0.69); // CIE 1931 spectrum locus at 630 nm: x ≈ 0.708 (CIE 15 table, from memory)
  });

  it('gives the α-opic metrics of the spectrum alone (CIE S 026/E:2018)', () => {
    const cyan = summariseSpectrum(grid((l) => Math.exp(-(((l - 490) / 20) ** 2))));
    const red = summariseSpectrum(grid((l) => Math.exp(-(((l - 620) / 20) ** 2))));
    // CIE S 026/E:2018: s_mel peaks near 490 nm and is near zero at 620 nm, so per lumen cyan far exceeds red
    expect(cyan.alphaOpic.der.melanopic).toBeGreaterThan(10 * red.alphaOpic.der.melanopic);
    // CIE S 026/E:2018: melanopic EDI = illuminance × melanopic DER
    expect(cyan.alphaOpic.melanopicEdiPer1000Lx).toBeCloseTo(1000 * cyan.alphaOpic.der.melanopic, 9);
  });
});
