import { describe, expect, it } from 'vitest';
import {
  checkActual,
  largestRemainder,
  parseReadingG,
  Rat,
  scaleByFactor,
  slurryAge,
  slurryExpiry
} from '../../../../src/lib/batches/weighout';
import { input } from './fixtures';

describe('exact decimals', () => {
  it('reads what was typed, not the nearest double', () => {
    // 0.1 + 0.2 is 0.30000000000000004 in binary floating point (IEEE 754); exactly 0.3 as decimals.
    expect(Rat.fromNumber(0.1).add(Rat.fromNumber(0.2)).eq(Rat.parse('0.3')!)).toBe(true);
    expect(Rat.parse('1e-7')!.toDecimal()).toBe('0.0000001');
    expect(new Rat(1n, 3n).toFixed(3)).toBe('0.333');
    expect(new Rat(2n, 3n).toFixed(3)).toBe('0.667');
    expect(Rat.parse('abc')).toBeNull();
  });
});

describe('largest-remainder apportionment (Hamilton; Balinski & Young 2001)', () => {
  it('gives the left-over units to the largest remainders', () => {
    // 10 seats, shares 4.6, 3.3, 2.1 → floors 4, 3, 2 (9), one left → 4.6 has the largest remainder → 5, 3, 2.
    expect(largestRemainder([Rat.parse('4.6')!, Rat.parse('3.3')!, Rat.parse('2.1')!], 10n)).toEqual([5n, 3n, 2n]);
  });
  it('refuses shares that do not add up to the total', () => {
    expect(() => largestRemainder([Rat.int(1), Rat.int(2)], 4n)).toThrow();
  });
});

describe('balance readings against the allowed range', () => {
  const line = { targetG: '2.400', lowG: '2.388', highG: '2.412' };
  it.each([
    ['2.3879', 'below'],
    ['2.388', 'in'],
    ['2.400', 'in'],
    ['2.412', 'in'],
    ['2.4121', 'above'],
    ['2,395', 'in'],
    ['2.45 g', 'above']
  ])('%s g is %s', (text, status) => {
    expect(checkActual(parseReadingG(text)!, line).status).toBe(status);
  });
  it('states the deviation exactly', () => {
    // 2.4121 − 2.400 = 0.0121 g; 0.0121 / 2.4 = 0.504 %.
    const c = checkActual(parseReadingG('2.4121')!, line);
    expect(c.deviationG).toBe('0.0121');
    expect(c.deviationPct).toBeCloseTo(0.504, 3);
  });
  it.each(['', 'abc', '-1', '1.2.3', '1e3'])('refuses %j as a reading', (t) => expect(parseReadingG(t)).toBeNull());
});

describe('slurry age and pot life', () => {
  const mixed = new Date('2026-12-02T10:00:00Z');
  it('uses the pot life when no plant limit is shorter', () => {
    const l = slurryExpiry(mixed, 240);
    expect(l.expiresAt.toISOString()).toBe('2026-12-02T14:00:00.000Z');
    expect(l.limitedBy).toBe('potLife');
  });
  it('uses a shorter plant slurry-age limit', () => {
    const l = slurryExpiry(mixed, 240, 120);
    expect(l.expiresAt.toISOString()).toBe('2026-12-02T12:00:00.000Z');
    expect(l.limitedBy).toBe('plantLimit');
    expect(slurryAge(l, new Date('2026-12-02T11:30:00Z'))).toEqual({ ageMin: 90, remainingMin: 30, expired: false });
    expect(slurryAge(l, new Date('2026-12-02T12:00:00Z')).expired).toBe(true);
  });

  it('reads age 0 and the whole limit, never "age −1 min", on a clock just behind the mixing time', () => {
    const l = slurryExpiry(new Date('2026-12-02T10:00:00Z'), 90);
    expect(slurryAge(l, new Date('2026-12-02T09:59:20Z'))).toEqual({ ageMin: 0, remainingMin: 90, expired: false });
  });
});

describe('scaling', () => {
  it('scales by a factor to the nearest balance step', () => {
    // 20.000 g × 1.5 = 30.000 g; 20.000 g × 0.3333 = 6.666 g.
    expect(scaleByFactor(input(), '20.000', 1.5).sizing).toEqual({ kind: 'mass', batchMassG: 30 });
    expect(scaleByFactor(input(), '20.000', 0.3333).sizing).toEqual({ kind: 'mass', batchMassG: 6.666 });
  });
});
