import { describe, expect, it } from 'vitest';
import { histogram, niceStep } from '../../../src/lib/measurements/index';

// Equal-width bins on 1-2-2.5-5 × 10ᵏ boundaries (the usual axis-tick rule) [common practice]; worked by hand.
describe('histogram', () => {
  it('nice widths', () => {
    expect(niceStep(200, 10)).toBe(20); // 20 = 2 × 10¹
    expect(niceStep(9, 10)).toBe(1); // 0.9 → 1
    expect(niceStep(23, 10)).toBe(2.5); // 2.3 → 2.5
    expect(niceStep(0.03, 10)).toBeCloseTo(0.005, 12); // 0.003 → 0.005
  });
  it('CCT 2900–3100 K in 20 K bins; the top edge is in the last bin', () => {
    const bins = histogram([2900, 2950, 3000, 3050, 3100], 10);
    expect(bins).toHaveLength(10);
    expect(bins[0]).toEqual({ x0: 2900, x1: 2920, count: 1 });
    expect(bins[2]).toEqual({ x0: 2940, x1: 2960, count: 1 });
    expect(bins[5]).toEqual({ x0: 3000, x1: 3020, count: 1 });
    expect(bins[9]).toEqual({ x0: 3080, x1: 3100, count: 1 });
    expect(bins.reduce((a, b) => a + b.count, 0)).toBe(5);
  });
  it('one repeated value makes one bin centred on it (90/50 = 1.8 → width 2); missing values are left out', () => {
    expect(histogram([90, 90, null, Number.NaN], 10)).toEqual([{ x0: 89, x1: 91, count: 2 }]);
  });
  it('no values, no bins', () => {
    expect(histogram([])).toEqual([]);
  });
});
