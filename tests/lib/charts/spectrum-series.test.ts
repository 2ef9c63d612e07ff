import { describe, expect, it } from 'vitest';
import { describeSeries, halfMaximumCrossings, normalised } from '../../../src/lib/charts/spectrum-series';

describe('spectrum chart helpers', () => {
  it('normalises to the maximum', () => {
    expect(normalised([1, 2, 4])).toEqual([0.25, 0.5, 1]);
    expect(normalised([0, 0])).toEqual([0, 0]);
  });

  it('finds half-maximum crossings by linear interpolation (hand-worked triangle)', () => {
    // Triangle 0 at 500 nm, 1 at 520 nm, 0 at 560 nm: half maximum at 510 nm and 540 nm.
    const wl = [500, 520, 560];
    expect(halfMaximumCrossings(wl, [0, 1, 0], 520)).toEqual({ left: 510, right: 540 });
  });

  it('describes a series in words for screen readers', () => {
    expect(describeSeries({ name: 'Emission', wavelengths: [400, 700], values: [1, 1] }, { peakNm: 550.04, fwhmNm: 80 })).toBe(
      'Emission: 400–700 nm, 2 points, peak 550 nm, FWHM 80 nm.'
    );
  });
});
