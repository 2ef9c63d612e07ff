import { describe, expect, it } from 'vitest';
import { signedChange } from '../../../src/lib/designer/signed-change';

describe('a change beside a slider', () => {
  it('is signed at its precision, with a true minus sign', () => {
    expect(signedChange(12.4, 0, 'K')).toBe('+12 K');
    expect(signedChange(-3.6, 0, 'K')).toBe('−4 K');
    expect(signedChange(0.00042, 4)).toBe('+0.0004');
  });

  it('reads "< 1 K" when it rounds to nothing, never "+0 K" or "−0 K"', () => {
    expect(signedChange(0.3, 0, 'K')).toBe('< 1 K');
    expect(signedChange(-0.49, 0, 'K')).toBe('< 1 K');
    expect(signedChange(-0.00004, 4)).toBe('< 0.0001');
    expect(signedChange(Number.NaN, 0, 'K')).toBe('—');
  });
});
