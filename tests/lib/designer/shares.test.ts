import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evenShares, normaliseShares, roundedShares, setShare, setShareProportional } from '../../../src/lib/designer/shares';

describe('mixing-desk shares', () => {
  it('setting the pump leak keeps the phosphors in proportion (hand-worked)', () => {
    // [0.1, 0.3, 0.6] with component 0 set to 0.2: the rest (0.9) becomes 0.8, so 0.3 → 0.2667 and 0.6 → 0.5333.
    const s = setShare([0.1, 0.3, 0.6], 0, 0.2);
    expect(s[0]).toBe(0.2);
    expect(s[1]).toBeCloseTo(0.3 * (0.8 / 0.9), 12);
    expect(s[2]).toBeCloseTo(0.6 * (0.8 / 0.9), 12);
  });

  it('splits the remainder evenly when the others were all zero', () => {
    expect(setShare([1, 0, 0], 0, 0.4)).toEqual([0.4, 0.3, 0.3]);
  });

  it('takes a phosphor change out of the pump leak first (hand-worked)', () => {
    // [0.3, 0.2, 0.5] with phosphor 1 set to 0.35: the leak gives up 0.15 → [0.15, 0.35, 0.5].
    const s = setShare([0.3, 0.2, 0.5], 1, 0.35);
    expect(s[0]).toBeCloseTo(0.15, 12);
    expect(s[1]).toBe(0.35);
    expect(s[2]).toBe(0.5);
  });

  it('typing each phosphor share in turn gives exactly those shares, the leak takes the rest', () => {
    let s = [0.7, 0.1, 0.1, 0.1];
    s = setShare(s, 3, 0.4287);
    s = setShare(s, 2, 0.2346);
    s = setShare(s, 1, 0.2667);
    [0.2667, 0.2346, 0.4287].forEach((v, i) => expect(s[i + 1]).toBeCloseTo(v, 12));
    expect(s[0]).toBeCloseTo(0.07, 12);
  });

  it('takes from the other phosphors in proportion once the leak is used up (hand-worked)', () => {
    // [0.1, 0.3, 0.2, 0.4] with phosphor 1 set to 0.6: leak 0.1 is not enough for +0.3; the leak goes to 0
    // and phosphors 2 and 3 share the remaining 0.4 as 0.2:0.4 → 0.1333, 0.2667.
    const s = setShare([0.1, 0.3, 0.2, 0.4], 1, 0.6);
    expect(s[0]).toBe(0);
    expect(s[2]).toBeCloseTo(0.4 / 3, 12);
    expect(s[3]).toBeCloseTo(0.8 / 3, 12);
  });

  it('clamps to 0…1 and treats junk as 0', () => {
    expect(setShare([0.5, 0.5], 1, 1.7)).toEqual([0, 1]);
    expect(setShare([0.5, 0.5], 1, Number.NaN)).toEqual([1, 0]);
    expect(() => setShare([0.5, 0.5], 2, 0.1)).toThrow(RangeError);
  });

  it('always adds up to 1 (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.nat(),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (w, k, s) => {
          const out = setShare(normaliseShares(w), k % w.length, s);
          const prop = setShareProportional(normaliseShares(w), k % w.length, s);
          expect(prop.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
          expect(Math.min(...out)).toBeGreaterThanOrEqual(0);
          expect(out.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
          expect(out[k % w.length]).toBeCloseTo(s, 12);
        }
      )
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
