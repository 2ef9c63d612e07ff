import { describe, expect, it } from 'vitest';
import { wilsonInterval } from '../../../src/lib/blend/spread/wilson';

describe('Wilson score interval', () => {
  // Worked examples of Newcombe, Stat. Med. 17 (1998) 857–872, Table I, method 3 (score), 95 % —
  // values to 4 decimals recalled from the paper (from memory).
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718]
  ])('%i of %i → %f to %f', (k, n, low, high) => {
    const ci = wilsonInterval(k, n)!;
    expect(ci.low).toBeCloseTo(low, 4);
    expect(ci.high).toBeCloseTo(high, 4);
  });

  it('refuses impossible counts', () => {
    expect(wilsonInterval(3, 0)).toBeNull();
    expect(wilsonInterval(5, 4)).toBeNull();
  });
});
