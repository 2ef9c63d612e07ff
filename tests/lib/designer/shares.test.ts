import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evenShares, normaliseShares, roundedShares, setShare } from '../../../src/lib/designer/shares';

describe('mixing-desk shares', () => {
  it('setting one share keeps the others in proportion (hand-worked)', () => {
    // [0.1, 0.3, 0.6] with component 0 set to 0.2: the rest (0.9) becomes 0.8, so 0.3 → 0.2667 and 0.6 → 0.5333.
    const s = setShare([0.1, 0.3, 0.6], 0, 0.2);
    expect(s[0]).toBe(0.2);
    expect(s[1]).toBeCloseTo(0.3 * (0.8 / 0.9), 12);
    expect(s[2]).toBeCloseTo(0.6 * (0.8 / 0.9), 12);
  });

  it('splits the remainder evenly when the others were all zero', () => {
    expect(setShare([1, 0, 0], 0, 0.4)).toEqual([0.4, 0.3, 0.3]);
  });

  it('clamps to 0…1 and treats junk as 0', () => {
    expect(setShare([0.5, 0.5], 1, 1.7)).toEqual([0, 1]);
    expect(setShare([0.5, 0.5], 1, Number.NaN)).toEqual([1, 0]);
    expect(() => setShare([0.5, 0.5], 2, 0.1)).toThrow(RangeError);
  });

  it('always adds up to 1 (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: 2, maxLength: 6 }), fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), (w, k, s) => {
        const out = setShare(normaliseShares(w), k % w.length, s);
        expect(out.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
        expect(out[k % w.length]).toBeCloseTo(s, 12);
      })
    );
  });

  it('normalises weights, and gives even shares for all-zero weights', () => {
    expect(normaliseShares([1, 3])).toEqual([0.25, 0.75]);
    expect(normaliseShares([0, -1, Number.NaN])).toEqual(evenShares(3));
  });

  it('rounds to 4 decimals and still adds up to exactly 1', () => {
    const r = roundedShares([1 / 3, 1 / 3, 1 / 3]);
    expect(r.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(r.filter((v) => v === 0.3333)).toHaveLength(2);
  });
});
