import { describe, expect, it } from 'vitest';
import { massAtStep } from '../../../../src/lib/batches/weighout/mass-at-step';

describe('a mass at its balance step', () => {
  it('shows every line of a 0.001 g balance with three decimals', () => {
    expect(massAtStep(64.9, 0.001)).toBe('64.900');
    expect(massAtStep('2.857', '0.001')).toBe('2.857');
    expect(massAtStep(120, 0.01)).toBe('120.00');
    expect(massAtStep(3.5, 1)).toBe('4');
  });
});
