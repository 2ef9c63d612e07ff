/**
 * Coverage of an emission file: thresholds are common practice (baseline under 2 % of the peak; an
 * end at 20 % or more inside 380–780 nm, the band where the CIE 15:2004 colour-matching functions carry
 * the colour, means the band is cut off).
 */
import { describe, expect, it } from 'vitest';
import { emissionCoverage } from '../../../src/lib/library/spectrum-coverage';

const gaussian = (from: number, to: number, peak: number, sigma: number) => {
  const wavelengths: number[] = [];
  for (let w = from; w <= to; w += 1) wavelengths.push(w);
  return { wavelengths, values: wavelengths.map((w) => Math.exp(-0.5 * ((w - peak) / sigma) ** 2)) };
};

describe('emission coverage', () => {
  it('refuses the 540–580 nm file of a broad yellow band, naming both ends and the band needed', () => {
    const r = emissionCoverage(gaussian(540, 580, 560, 45));
    expect(r.refusal).toMatch(/cut off at 540 nm \(short-wavelength end, still 9\d % of the peak\) and at 580 nm/);
    expect(r.refusal).toMatch(/380–780 nm/);
  });

  it('accepts a full band silently, and warns when one tail stops above the baseline', () => {
    expect(emissionCoverage(gaussian(400, 800, 560, 40))).toEqual({ refusal: null, warnings: [] });
    // exp(−0.5·(100/40)²) = 4.4 % of the peak at 460 nm: above 2 %, below 20 %.
    const tail = emissionCoverage(gaussian(460, 800, 560, 40));
    expect(tail.refusal).toBeNull();
    expect(tail.warnings).toEqual([
      expect.stringMatching(/^The emission is still at 4 % of its peak at 460 nm \(the short-wavelength end/)
    ]);
  });

  it('does not refuse an end outside the visible band (a deep-red tail measured to 800 nm)', () => {
    // At 790 nm a band centred on 760 nm (σ 20 nm) is still at exp(−0.5·1.5²) = 32 % of its peak: outside 380–780 nm, a warning only.
    const red = emissionCoverage(gaussian(700, 790, 760, 20));
    expect(red.refusal).toBeNull();
    expect(red.warnings).toEqual([expect.stringMatching(/^The emission is still at 32 % of its peak at 790 nm/)]);
  });
});
