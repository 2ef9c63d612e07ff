import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decimalPlacesOf, partsMassG } from '../../../../src/lib/batches/weighout/limits';
import { sizingSchema } from '../../../../src/lib/batches/weighout/schema';

describe('batch limits (pure)', () => {
  it('counts decimal places as written, exponent forms included', () => {
    expect([0.001, 1e-6, 1e-7, 12.5, 100000, 0.0500001].map(decimalPlacesOf)).toEqual([3, 6, 7, 1, 0, 7]);
    expect(decimalPlacesOf(Number.NaN)).toBe(Infinity);
  });

  it('property: k / 10^p has at most p places, and refusal matches the 6 stored places (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000_000 }), fc.integer({ min: 0, max: 9 }), (k, p) => {
        const v = k / 10 ** p;
        expect(decimalPlacesOf(v)).toBeLessThanOrEqual(p);
        const ok = sizingSchema.safeParse({ kind: 'parts', partCount: 1, dispenseMassG: v, yieldLossPct: 0 }).success;
        expect(ok).toBe(v <= 1000 && decimalPlacesOf(v) <= 6);
      }),
      { numRuns: 1000, seed: 7 }
    );
  });

  it('derives the part-count mass exactly: 850 × 100 g ÷ (1 − 15 %) = 100 kg (common practice: allowance on the good share)', () => {
    expect(partsMassG(850, 100, 15).toDecimal()).toBe('100000');
    expect(sizingSchema.safeParse({ kind: 'parts', partCount: 850, dispenseMassG: 100, yieldLossPct: 15 }).success).toBe(true);
    const over = sizingSchema.safeParse({ kind: 'parts', partCount: 1_000_000, dispenseMassG: 150, yieldLossPct: 15 });
    expect(over.error?.issues[0]).toMatchObject({ path: ['partCount'], message: expect.stringMatching(/at most 100 kg/) });
  });
});
