import { describe, expect, it } from 'vitest';
import { BENCH_CONDITION, describeCondition, isBenchCondition, operatingConditionSchema } from '../../src/lib/aim';

describe('operating condition of a target', () => {
  it('defaults to the junction and no stated current; bench is 25 °C (common practice)', () => {
    expect(operatingConditionSchema.parse({ temperatureC: 85 })).toEqual({ reference: 'junction', temperatureC: 85, driveCurrentMa: null });
    expect(BENCH_CONDITION.temperatureC).toBe(25);
    expect(isBenchCondition(null)).toBe(true);
    expect(isBenchCondition({ reference: 'junction', temperatureC: 85, driveCurrentMa: 350 })).toBe(false);
  });

  it('reads as a line of a ticket', () => {
    expect(describeCondition(null)).toBe('bench (25 °C)');
    expect(describeCondition({ reference: 'junction', temperatureC: 85, driveCurrentMa: 350 })).toBe('Tj 85 °C, 350 mA');
    expect(describeCondition({ reference: 'solderPoint', temperatureC: 85, driveCurrentMa: null })).toBe('Ts 85 °C');
  });

  it('refuses temperatures outside −40 to 200 °C and a non-positive current', () => {
    expect(operatingConditionSchema.safeParse({ temperatureC: 250 }).success).toBe(false);
    expect(operatingConditionSchema.safeParse({ temperatureC: 85, driveCurrentMa: 0 }).success).toBe(false);
  });
});
