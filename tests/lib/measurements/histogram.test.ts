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
  it('a value on a bin edge up to binary rounding counts in the bin above it (half-open bins), worked by hand', () => {
    // 0.1 + 0.2 = 0.30000000000000004 and 0.1 × 7 = 0.7000000000000001 in binary (IEEE 754); 0.7 / 0.1 = 6.999999999999999
    const bins = histogram([0, 0.1 + 0.2, 0.1 * 7, 0.7, 1], 10);
    expect(bins).toHaveLength(10);
    expect(bins[3].count).toBe(1); // [0.3, 0.4)
    expect(bins[7].count).toBe(2); // [0.7, 0.8): both sevenths, neither in [0.6, 0.7)
    expect(bins[6].count).toBe(0);
    expect(bins[9].count).toBe(1); // the top edge 1 in the last bin
  });
  it('no values, no bins', () => {
    expect(histogram([])).toEqual([]);
  });
});
